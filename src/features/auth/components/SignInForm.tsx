import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { signInSchema } from '../../../../shared/schemas/auth.schema';
import type { User } from '../../../../shared/schemas/user.schema';
import { Button } from '../../../components/ui/Button';
import { InlineError } from '../../../components/ui/ErrorState';
import { TextField } from '../../../components/ui/Field';
import { useSignIn } from '../api/sign-in';

/** E-mail and password; the server's answer (wrong details, too many attempts) shows under the form. */
export function SignInForm({ onSignedIn }: { onSignedIn: (user: User) => void }) {
  const signIn = useSignIn();
  const {
    register,
    handleSubmit,
    formState: { errors },
  } = useForm({ resolver: zodResolver(signInSchema), defaultValues: { email: '', password: '' } });

  return (
    <form
      noValidate
      className="flex flex-col gap-4"
      onSubmit={handleSubmit((values) => signIn.mutate(values, { onSuccess: onSignedIn }))}
    >
      <TextField
        label="E-mail"
        type="email"
        autoComplete="username"
        inputMode="email"
        autoFocus
        error={errors.email ? 'Enter your e-mail address' : undefined}
        {...register('email')}
      />
      <TextField
        label="Password"
        type="password"
        autoComplete="current-password"
        error={errors.password ? 'Enter your password' : undefined}
        {...register('password')}
      />
      <InlineError error={signIn.error} />
      <Button type="submit" variant="primary" busy={signIn.isPending} className="w-full">
        Sign in
      </Button>
    </form>
  );
}
