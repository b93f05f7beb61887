import { zodResolver } from '@hookform/resolvers/zod';
import { useEffect } from 'react';
import { useForm } from 'react-hook-form';
import { ROLES, type Role } from '../../../../shared/schemas/role.schema';
import { userCreateSchema, type UserCreate } from '../../../../shared/schemas/user.schema';
import { Button } from '../../../components/ui/Button';
import { InlineError } from '../../../components/ui/ErrorState';
import { SelectField, TextField } from '../../../components/ui/Field';
import { ApiError, issuesOf } from '../../../lib/api-error';
import { applyServerIssues } from '../../../lib/form-errors';
import { roleDuties, roleLabels } from '../../auth/permissions';
import { CURRENT_PASSWORD_HINT, CURRENT_PASSWORD_LABEL, currentPasswordError } from './reauthentication';

const FIELDS = ['email', 'displayName', 'role', 'password', 'currentPassword'] as const;
export const roleOptions = ROLES.map((r) => ({ value: r, label: `${roleLabels[r]} — ${roleDuties[r]}` }));

interface UserFormProps {
  busy: boolean;
  error: unknown;
  onSubmit: (values: UserCreate) => void;
  onCancel: () => void;
}

/** A new person for the shop: name, e-mail, role and a first password to hand over. */
export function UserForm({ busy, error, onSubmit, onCancel }: UserFormProps) {
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm({
    resolver: zodResolver(userCreateSchema),
    defaultValues: { email: '', displayName: '', role: 'fabricator' as Role, password: '', currentPassword: '' },
  });
  useEffect(() => {
    if (error) applyServerIssues(error, setError, FIELDS);
    if (error instanceof ApiError && error.code === 'duplicate') {
      setError('email', { type: 'server', message: 'Someone in the shop already signs in with this e-mail.' });
    }
    const wrong = currentPasswordError(error);
    if (wrong) setError('currentPassword', { type: 'server', message: wrong });
  }, [error, setError]);
  const placed = issuesOf(error).some((i) => (FIELDS as readonly string[]).includes(i.path.join('.')));
  const showGeneral =
    Boolean(error) && !placed && !currentPasswordError(error) && !(error instanceof ApiError && error.code === 'duplicate');

  return (
    <form noValidate onSubmit={handleSubmit(onSubmit)} className="flex flex-col gap-4">
      <TextField label="Name" autoComplete="off" error={errors.displayName?.message} {...register('displayName')} />
      <TextField label="E-mail" type="email" autoComplete="off" error={errors.email?.message} {...register('email')} />
      <SelectField label="Role" options={roleOptions} error={errors.role?.message} {...register('role')} />
      <TextField
        label="First password"
        type="password"
        autoComplete="new-password"
        hint="At least 10 characters. Hand it over in person; they can be given a new one any time."
        error={errors.password?.message}
        {...register('password')}
      />
      <TextField
        label={CURRENT_PASSWORD_LABEL}
        type="password"
        autoComplete="current-password"
        hint={CURRENT_PASSWORD_HINT}
        error={errors.currentPassword?.message}
        {...register('currentPassword')}
      />
      {showGeneral ? <InlineError error={error} /> : null}
      <div className="flex justify-end gap-2 border-t border-steel-200 pt-4">
        <Button variant="ghost" onClick={onCancel}>
          Cancel
        </Button>
        <Button type="submit" variant="primary" busy={busy}>
          Add user
        </Button>
      </div>
    </form>
  );
}
