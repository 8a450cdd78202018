import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { signInSchema } from '../../../../shared/schemas/auth';
import { TextField } from '../../../components/ui/text-field';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { showApiError } from '../../../lib/form-errors';
import { useSignIn } from '../api/sign-in';

/** E-mail and password; a wrong pair shows one message that does not say which was wrong. */
export function SignInForm({ onDone }: { onDone: () => void }) {
  const signIn = useSignIn();
  const { register, handleSubmit, setError, formState } = useForm({
    resolver: zodResolver(signInSchema),
    defaultValues: { email: '', password: '' },
  });
  const { errors, isSubmitting } = formState;
  const submit = handleSubmit(async (values) => {
    try {
      await signIn.mutateAsync(values);
      onDone();
    } catch (error) {
      showApiError(error, setError, ['email', 'password']);
    }
  });
  return (
    <form onSubmit={submit} noValidate className="space-y-4">
      {errors.root?.message && <Notice tone="error">{errors.root.message}</Notice>}
      <TextField
        label="E-mail address"
        type="email"
        autoComplete="email"
        registration={register('email')}
        error={errors.email}
      />
      <TextField
        label="Password"
        type="password"
        autoComplete="current-password"
        registration={register('password')}
        error={errors.password}
      />
      <Button type="submit" disabled={isSubmitting}>
        {isSubmitting ? 'Signing in…' : 'Sign in'}
      </Button>
    </form>
  );
}
