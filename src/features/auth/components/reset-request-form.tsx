import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { resetRequestSchema } from '../../../../shared/schemas/auth';
import { TextField } from '../../../components/ui/text-field';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { showApiError } from '../../../lib/form-errors';
import { useRequestPasswordReset } from '../api/password-reset';

/** Asks for a reset link; the answer never tells whether the address has an account. */
export function ResetRequestForm() {
  const request = useRequestPasswordReset();
  const [answer, setAnswer] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState } = useForm({
    resolver: zodResolver(resetRequestSchema),
    defaultValues: { email: '' },
  });
  const { errors, isSubmitting } = formState;
  const submit = handleSubmit(async (values) => {
    try {
      setAnswer((await request.mutateAsync(values)).message);
    } catch (error) {
      showApiError(error, setError, ['email']);
    }
  });
  if (answer) return <Notice tone="success">{answer} The link works for one hour.</Notice>;
  return (
    <form onSubmit={submit} noValidate className="space-y-4">
      {errors.root?.message && <Notice tone="error">{errors.root.message}</Notice>}
      <TextField
        label="E-mail address of your account"
        type="email"
        autoComplete="email"
        registration={register('email')}
        error={errors.email}
      />
      <Button type="submit" disabled={isSubmitting}>
        Send me a link
      </Button>
    </form>
  );
}
