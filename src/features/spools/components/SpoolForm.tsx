import { zodResolver } from '@hookform/resolvers/zod';
import { useEffect, type ReactNode } from 'react';
import { useForm } from 'react-hook-form';
import { spoolCreateSchema, type SpoolCreate } from '../../../../shared/schemas/spool.schema';
import { Button } from '../../../components/ui/Button';
import { InlineError } from '../../../components/ui/ErrorState';
import { TextField } from '../../../components/ui/Field';
import { ApiError, issuesOf } from '../../../lib/api-error';
import { applyServerIssues } from '../../../lib/form-errors';

const FIELDS = ['mark', 'lineNumber'] as const;

interface SpoolFormProps {
  initial?: SpoolCreate;
  submitLabel: string;
  busy: boolean;
  error: unknown;
  /** `changed` lists the fields the user edited. */
  onSubmit: (values: SpoolCreate, changed: (keyof SpoolCreate)[]) => void;
  onCancel: () => void;
  notice?: ReactNode;
}

/** Spool mark and line number, validated with the shared spool schema. */
export function SpoolForm({ initial, submitLabel, busy, error, onSubmit, onCancel, notice }: SpoolFormProps) {
  const {
    register,
    handleSubmit,
    setError,
    reset,
    formState: { errors, dirtyFields },
  } = useForm({ resolver: zodResolver(spoolCreateSchema), defaultValues: initial ?? { mark: '', lineNumber: '' } });

  // A newer record (after a 409 and reload): untouched fields take its values, the user's edits stay.
  const initialMark = initial?.mark;
  const initialLine = initial?.lineNumber;
  useEffect(() => {
    if (initialMark !== undefined && initialLine !== undefined) {
      reset({ mark: initialMark, lineNumber: initialLine }, { keepDirtyValues: true });
    }
  }, [initialMark, initialLine, reset]);

  useEffect(() => {
    if (error) applyServerIssues(error, setError, FIELDS);
    if (error instanceof ApiError && error.code === 'duplicate') {
      setError('mark', { type: 'server', message: 'This job already has a spool with this mark.' });
    }
  }, [error, setError]);

  const placed = issuesOf(error).some((i) => (FIELDS as readonly string[]).includes(i.path.join('.')));
  const showGeneral = Boolean(error) && !placed && !(error instanceof ApiError && (error.isStale || error.code === 'duplicate'));

  return (
    <form
      noValidate
      onSubmit={handleSubmit((values) => onSubmit(values, Object.keys(dirtyFields) as (keyof SpoolCreate)[]))}
      className="flex flex-col gap-4"
    >
      <TextField
        label="Spool mark"
        mono
        placeholder="CW-201-S03"
        hint="Unique within the job; printed on the sheet and the spool tag."
        error={errors.mark?.message}
        {...register('mark')}
      />
      <TextField
        label="Line number"
        mono
        placeholder="CW-201"
        hint="As on the client's isometric."
        error={errors.lineNumber?.message}
        {...register('lineNumber')}
      />
      {notice}
      {showGeneral ? <InlineError error={error} /> : null}
      <div className="flex flex-wrap justify-end gap-2 border-t border-steel-200 pt-4">
        <Button variant="ghost" onClick={onCancel}>
          Cancel
        </Button>
        <Button type="submit" variant="primary" busy={busy}>
          {submitLabel}
        </Button>
      </div>
    </form>
  );
}
