import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { signUpSchema } from '../../../../shared/schemas/auth';
import { TextField } from '../../../components/ui/text-field';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { showApiError } from '../../../lib/form-errors';
import { useSignUp } from '../api/sign-up';

/** Name, e-mail and password; on success the new user is signed in and `onDone` runs. */
export function SignUpForm({ onDone, email }: { onDone: () => void; email?: string }) {
  const signUp = useSignUp();
  const { register, handleSubmit, setError, formState } = useForm({
    resolver: zodResolver(signUpSchema),
    defaultValues: { name: '', email: email ?? '', password: '' },
  });
  const { errors, isSubmitting } = formState;
  const submit = handleSubmit(async (values) => {
    try {
      await signUp.mutateAsync(values);
      onDone();
    } catch (error) {
      showApiError(error, setError, ['name', 'email', 'password']);
    }
  });
  return (
    <form onSubmit={submit} noValidate className="space-y-4">
      {errors.root?.message && <Notice tone="error">{errors.root.message}</Notice>}
      <TextField label="Your name" autoComplete="name" registration={register('name')} error={errors.name} />
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
        autoComplete="new-password"
        hint="At least 10 characters. A few unrelated words make a strong one."
        registration={register('password')}
        error={errors.password}
      />
      <Button type="submit" disabled={isSubmitting}>
        {isSubmitting ? 'Creating your account…' : 'Create account'}
      </Button>
    </form>
  );
}
