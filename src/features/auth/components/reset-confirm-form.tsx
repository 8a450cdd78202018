import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { Link } from 'react-router-dom';
import { resetConfirmSchema } from '../../../../shared/schemas/auth';
import { TextField } from '../../../components/ui/text-field';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { showApiError } from '../../../lib/form-errors';
import { useConfirmPasswordReset } from '../api/password-reset';

/** Sets a new password with the token from the mailed link. */
export function ResetConfirmForm({ token }: { token: string }) {
  const confirm = useConfirmPasswordReset();
  const { register, handleSubmit, setError, formState } = useForm({
    resolver: zodResolver(resetConfirmSchema),
    defaultValues: { token, password: '' },
  });
  const { errors, isSubmitting } = formState;
  const submit = handleSubmit(async (values) => {
    try {
      await confirm.mutateAsync(values);
    } catch (error) {
      showApiError(error, setError, ['password']);
    }
  });
  if (confirm.isSuccess) {
    return (
      <Notice tone="success">
        Your password is changed and every device is signed out.{' '}
        <Link to="/sign-in" className="underline">
          Sign in
        </Link>{' '}
        with the new one.
      </Notice>
    );
  }
  return (
    <form onSubmit={submit} noValidate className="space-y-4">
      {errors.root?.message && <Notice tone="error">{errors.root.message}</Notice>}
      <TextField
        label="New password"
        type="password"
        autoComplete="new-password"
        hint="At least 10 characters."
        registration={register('password')}
        error={errors.password}
      />
      <Button type="submit" disabled={isSubmitting}>
        Set new password
      </Button>
    </form>
  );
}
