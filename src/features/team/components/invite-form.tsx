import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { createInvitationSchema } from '../../../../shared/schemas/invitation';
import { TextField } from '../../../components/ui/text-field';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { showApiError } from '../../../lib/form-errors';
import { useCreateInvitation } from '../api/create-invitation';
import { RoleSelect } from './role-select';

/** Invites an address in a role; the invitation link goes out by e-mail. */
export function InviteForm({ teamId }: { teamId: string }) {
  const invite = useCreateInvitation(teamId);
  const { register, handleSubmit, setError, reset, formState } = useForm({
    resolver: zodResolver(createInvitationSchema),
    defaultValues: { email: '', role: 'viewer' as const },
  });
  const { errors, isSubmitting } = formState;
  const submit = handleSubmit(async (values) => {
    try {
      await invite.mutateAsync(values);
      reset();
    } catch (error) {
      showApiError(error, setError, ['email', 'role']);
    }
  });
  return (
    <form onSubmit={submit} noValidate className="max-w-xl space-y-4">
      {invite.isSuccess && <Notice tone="success">Invitation sent to {invite.data.email}.</Notice>}
      {errors.root?.message && <Notice tone="error">{errors.root.message}</Notice>}
      <TextField label="E-mail address to invite" type="email" registration={register('email')} error={errors.email} />
      <div className="space-y-1">
        <label htmlFor="invite-role" className="block font-medium">
          Role
        </label>
        <RoleSelect id="invite-role" {...register('role')} />
        {errors.role?.message && <p className="text-sm font-medium text-kiln">{errors.role.message}</p>}
      </div>
      <Button type="submit" disabled={isSubmitting}>
        Send invitation
      </Button>
    </form>
  );
}
