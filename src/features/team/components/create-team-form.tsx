import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { teamInputSchema } from '../../../../shared/schemas/team';
import { TextField } from '../../../components/ui/text-field';
import { Button } from '../../../components/ui/button';
import { showApiError } from '../../../lib/form-errors';
import { useCreateTeam } from '../api/create-team';

/** Creates a shared team; `onCreated` receives its id so the page can switch to it. */
export function CreateTeamForm({ onCreated }: { onCreated: (teamId: string) => void }) {
  const create = useCreateTeam();
  const { register, handleSubmit, setError, reset, formState } = useForm({
    resolver: zodResolver(teamInputSchema),
    defaultValues: { name: '' },
  });
  const submit = handleSubmit(async (values) => {
    try {
      const team = await create.mutateAsync(values);
      reset();
      onCreated(team.id);
    } catch (error) {
      showApiError(error, setError, ['name']);
    }
  });
  return (
    <form onSubmit={submit} noValidate className="flex max-w-xl flex-wrap items-end gap-3">
      <div className="min-w-60 flex-1">
        <TextField label="New team name" registration={register('name')} error={formState.errors.name} />
        {formState.errors.root?.message && (
          <p role="alert" className="text-sm font-medium text-kiln">
            {formState.errors.root.message}
          </p>
        )}
      </div>
      <Button type="submit" disabled={formState.isSubmitting}>
        Create team
      </Button>
    </form>
  );
}
