import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { passwordResetSchema, type User } from '../../../../shared/schemas/user.schema';
import { Button } from '../../../components/ui/Button';
import { Dialog } from '../../../components/ui/Dialog';
import { InlineError } from '../../../components/ui/ErrorState';
import { TextField } from '../../../components/ui/Field';
import { useResetPassword } from '../api/reset-password';
import { CURRENT_PASSWORD_HINT, CURRENT_PASSWORD_LABEL, currentPasswordError } from './reauthentication';

/** The reset form: the user's new password and the admin's own. */
export function ResetPasswordForm({ user, onDone }: { user: User; onDone: () => void }) {
  const reset = useResetPassword();
  const {
    register,
    handleSubmit,
    formState: { errors },
  } = useForm({ resolver: zodResolver(passwordResetSchema), defaultValues: { password: '', currentPassword: '' } });
  const wrong = currentPasswordError(reset.error);
  return (
    <form noValidate className="flex flex-col gap-4" onSubmit={handleSubmit((body) => reset.mutate({ id: user.id, body }, { onSuccess: onDone }))}>
      <p className="text-sm text-ink-800">
        Sets a new password for <strong>{user.displayName}</strong> ({user.email}). Tell them in person.
      </p>
      <TextField label="New password" type="password" autoComplete="new-password" error={errors.password?.message} {...register('password')} />
      <TextField
        label={CURRENT_PASSWORD_LABEL}
        type="password"
        autoComplete="current-password"
        hint={CURRENT_PASSWORD_HINT}
        error={errors.currentPassword?.message ?? wrong ?? undefined}
        {...register('currentPassword')}
      />
      {wrong ? null : <InlineError error={reset.error} />}
      <div className="flex justify-end gap-2">
        <Button variant="ghost" onClick={onDone}>
          Cancel
        </Button>
        <Button type="submit" variant="primary" busy={reset.isPending}>
          Set password
        </Button>
      </div>
    </form>
  );
}

/** "Reset password" for one user (admin). */
export function ResetPasswordDialog({ user }: { user: User }) {
  const [open, setOpen] = useState(false);
  return (
    <>
      <Button variant="ghost" onClick={() => setOpen(true)}>
        Reset password
      </Button>
      <Dialog open={open} onClose={() => setOpen(false)} title="Reset password">
        <ResetPasswordForm user={user} onDone={() => setOpen(false)} />
      </Dialog>
    </>
  );
}
