import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { changePasswordSchema } from '../../../../shared/schemas/account';
import { TextField } from '../../../components/ui/text-field';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { showApiError } from '../../../lib/form-errors';
import { useChangePassword } from '../api/change-password';

/** Current and new password; on success every other device is signed out. */
export function ChangePasswordForm() {
  const change = useChangePassword();
  const { register, handleSubmit, setError, reset, formState } = useForm({
    resolver: zodResolver(changePasswordSchema),
    defaultValues: { currentPassword: '', newPassword: '' },
  });
  const { errors, isSubmitting } = formState;
  const submit = handleSubmit(async (values) => {
    try {
      await change.mutateAsync(values);
      reset();
    } catch (error) {
      showApiError(error, setError, ['currentPassword', 'newPassword']);
    }
  });
  return (
    <form onSubmit={submit} noValidate className="max-w-md space-y-4">
      {change.isSuccess && <Notice tone="success">Password changed. Your other devices are signed out.</Notice>}
      {errors.root?.message && <Notice tone="error">{errors.root.message}</Notice>}
      <TextField
        label="Current password"
        type="password"
        autoComplete="current-password"
        registration={register('currentPassword')}
        error={errors.currentPassword}
      />
      <TextField
        label="New password"
        type="password"
        autoComplete="new-password"
        hint="At least 10 characters."
        registration={register('newPassword')}
        error={errors.newPassword}
      />
      <Button type="submit" disabled={isSubmitting}>
        Change password
      </Button>
    </form>
  );
}
