import { zodResolver } from '@hookform/resolvers/zod';
import { useEffect, type ReactNode } from 'react';
import { Controller, useForm, useWatch } from 'react-hook-form';
import { jobCreateSchema, type Job, type JobCreate, type JobCreateInput } from '../../../../shared/schemas/job.schema';
import { FLANGE_CLASSES, SUPPORTED_FLANGE_CLASSES_TEXT } from '../../../../shared/standards/flanges';
import { Button } from '../../../components/ui/Button';
import { InlineError } from '../../../components/ui/ErrorState';
import { SelectField, TextField } from '../../../components/ui/Field';
import { LengthField } from '../../../components/ui/LengthField';
import { ApiError, issuesOf } from '../../../lib/api-error';
import { applyServerIssues } from '../../../lib/form-errors';
import { jobStatusDisplay } from './JobStatusBadge';

const FIELDS = [
  'number',
  'title',
  'client',
  'site',
  'units',
  'status',
  'spec.material',
  'spec.schedule',
  'spec.flangeClass',
  'spec.rootGapMm',
  'spec.sawKerfMm',
  'spec.minPieceLengthMm',
] as const;

/** Defaults for a new job: the shop's usual carbon-steel spec (editable per job). */
export const newJobDefaults: JobCreateInput = {
  number: '',
  title: '',
  client: '',
  site: '',
  units: 'mm',
  status: 'active',
  spec: {
    material: 'ASTM A106 Gr B',
    schedule: 'STD',
    flangeClass: 150,
    rootGapMm: 3,
    sawKerfMm: 3,
    minPieceLengthMm: 50,
  },
};

function valuesOf(job: Job): JobCreateInput {
  return {
    number: job.number,
    title: job.title,
    client: job.client,
    site: job.site,
    units: job.units,
    status: job.status === 'archived' ? 'active' : job.status,
    spec: { ...job.spec },
  };
}

// Only the classes Tackline has ASME B16.5 tables for: the schema refuses any other.
const supportedClassOptions = FLANGE_CLASSES.map((c) => ({ value: String(c), label: `Class ${c}` }));

/**
 * Class choices for a job. A job stored with a class Tackline has no table for keeps that
 * class on screen, marked, so saving is refused with the reason rather than the select
 * quietly showing another class.
 */
function flangeClassOptions(current: number | undefined): { value: string; label: string }[] {
  if (current === undefined || (FLANGE_CLASSES as readonly number[]).includes(current)) return supportedClassOptions;
  return [{ value: String(current), label: `Class ${current} (no tables: choose another)` }, ...supportedClassOptions];
}
const unitOptions = [
  { value: 'mm', label: 'Millimetres (mm)' },
  { value: 'ft-in', label: 'Feet-inches (to 1/16")' },
];
const statusOptions = (['active', 'on-hold', 'complete'] as const).map((s) => ({ value: s, label: jobStatusDisplay[s].label }));

interface JobFormProps {
  /** The job being edited; absent for a new job. */
  job?: Job;
  submitLabel: string;
  busy: boolean;
  error: unknown;
  /** `changed` lists the top-level fields the user edited (spec counts as one). */
  onSubmit: (values: JobCreate, changed: (keyof JobCreate)[]) => void;
  onCancel: () => void;
  /** Shown above the buttons, e.g. the stale-version notice. */
  notice?: ReactNode;
}

/** Job details and default spec, validated with the shared job schema; server issues land on their fields. */
export function JobForm({ job, submitLabel, busy, error, onSubmit, onCancel, notice }: JobFormProps) {
  const {
    register,
    handleSubmit,
    setError,
    control,
    reset,
    formState: { errors, dirtyFields },
  } = useForm({ resolver: zodResolver(jobCreateSchema), defaultValues: job ? valuesOf(job) : newJobDefaults });

  // A newer record (after a 409 and reload): untouched fields take its values, the user's edits stay.
  const version = job?.version;
  useEffect(() => {
    if (job) reset(valuesOf(job), { keepDirtyValues: true });
    // eslint-disable-next-line react-hooks/exhaustive-deps -- only a new version should reset
  }, [version, reset]);

  useEffect(() => {
    if (error) applyServerIssues(error, setError, FIELDS);
    if (error instanceof ApiError && error.code === 'duplicate') {
      setError('number', { type: 'server', message: 'Another job already has this number.' });
    }
  }, [error, setError]);

  const units = useWatch({ control, name: 'units' }) ?? 'mm';
  const placedOnField = issuesOf(error).some((i) => (FIELDS as readonly string[]).includes(i.path.join('.')));
  const showGeneralError =
    Boolean(error) && !placedOnField && !(error instanceof ApiError && (error.isStale || error.code === 'duplicate'));

  return (
    <form
      noValidate
      onSubmit={handleSubmit((values) => onSubmit(values, Object.keys(dirtyFields) as (keyof JobCreate)[]))}
      className="flex flex-col gap-5"
    >
      <fieldset className="grid gap-4 md:grid-cols-2">
        <legend className="mb-2 font-display text-lg font-semibold text-ink-800">Job</legend>
        <TextField label="Job number" mono placeholder="KPS-2041" error={errors.number?.message} {...register('number')} />
        <TextField label="Title" placeholder="Condenser water, Hall B" error={errors.title?.message} {...register('title')} />
        <TextField label="Client" error={errors.client?.message} {...register('client')} />
        <TextField label="Site" error={errors.site?.message} {...register('site')} />
        <SelectField label="Units on screens and sheets" options={unitOptions} error={errors.units?.message} {...register('units')} />
        <SelectField label="Status" options={statusOptions} error={errors.status?.message} {...register('status')} />
      </fieldset>
      <fieldset className="grid gap-4 md:grid-cols-3">
        <legend className="mb-2 font-display text-lg font-semibold text-ink-800">Default spec for new spools</legend>
        <TextField label="Pipe material" error={errors.spec?.material?.message} {...register('spec.material')} />
        <TextField label="Schedule / wall" mono error={errors.spec?.schedule?.message} {...register('spec.schedule')} />
        <SelectField
          label="Flange class (ASME B16.5)"
          hint={`Tackline lays out ${SUPPORTED_FLANGE_CLASSES_TEXT} only`}
          options={flangeClassOptions(job?.spec.flangeClass)}
          error={errors.spec?.flangeClass?.message}
          {...register('spec.flangeClass', { setValueAs: (v) => Number(v) })}
        />
        {(
          [
            ['spec.rootGapMm', 'Root gap', 'Per butt weld, off each cut length', errors.spec?.rootGapMm?.message],
            ['spec.sawKerfMm', 'Saw kerf', 'Lost per cut when nesting', errors.spec?.sawKerfMm?.message],
            ['spec.minPieceLengthMm', 'Shortest piece', 'Shorter cuts are flagged', errors.spec?.minPieceLengthMm?.message],
          ] as const
        ).map(([name, label, hint, error]) => (
          <Controller
            key={name}
            control={control}
            name={name}
            render={({ field }) => (
              <LengthField
                label={label}
                name={field.name}
                units={units}
                valueMm={field.value}
                onChangeMm={field.onChange}
                onBlur={field.onBlur}
                hint={hint}
                error={error}
              />
            )}
          />
        ))}
      </fieldset>
      {notice}
      {showGeneralError ? <InlineError error={error} /> : null}
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
