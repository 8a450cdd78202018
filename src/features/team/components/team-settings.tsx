import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { teamInputSchema, type TeamDetail } from '../../../../shared/schemas/team';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { TextField } from '../../../components/ui/text-field';
import { showApiError } from '../../../lib/form-errors';
import { useDeleteTeam, useRenameTeam } from '../api/team-detail';

/** Owners: rename the team, or delete it with everything it keeps (not a personal team). */
export function TeamSettings({ team, onDeleted }: { team: TeamDetail; onDeleted: () => void }) {
  return (
    <div className="max-w-xl space-y-6">
      <RenameTeamForm team={team} />
      {team.personal ? (
        <p className="text-sm text-ink-soft">This is your personal team: it stays as long as your account does.</p>
      ) : (
        <DeleteTeam team={team} onDeleted={onDeleted} />
      )}
    </div>
  );
}

function RenameTeamForm({ team }: { team: TeamDetail }) {
  const rename = useRenameTeam(team.id);
  const [saved, setSaved] = useState(false);
  const { register, handleSubmit, setError, formState } = useForm({
    resolver: zodResolver(teamInputSchema),
    defaultValues: { name: team.name },
  });
  const submit = handleSubmit(async (values) => {
    setSaved(false);
    try {
      await rename.mutateAsync(values);
      setSaved(true);
    } catch (error) {
      showApiError(error, setError, ['name']);
    }
  });
  return (
    <form onSubmit={submit} noValidate aria-label="Rename the team" className="flex flex-wrap items-end gap-3">
      <div className="min-w-60 flex-1">
        <TextField label="Team name" registration={register('name')} error={formState.errors.name} />
        {formState.errors.root?.message && (
          <p role="alert" className="text-sm font-medium text-kiln">
            {formState.errors.root.message}
          </p>
        )}
      </div>
      <Button type="submit" variant="quiet" disabled={formState.isSubmitting}>
        Rename
      </Button>
      <p role="status" className="w-full text-sm text-moss">
        {saved ? 'Renamed.' : ''}
      </p>
    </form>
  );
}

function DeleteTeam({ team, onDeleted }: { team: TeamDetail; onDeleted: () => void }) {
  const remove = useDeleteTeam(team.id, onDeleted);
  const [typed, setTyped] = useState('');
  return (
    <div className="space-y-3 rounded-md border border-kiln p-4">
      <h3 className="font-bold">Delete this team</h3>
      <p className="text-sm">
        Deleting {team.name} removes its presets and their versions, printer profiles, fit tests, team materials, kit
        history and invitations for every member. It cannot be undone: export the presets first if you want to keep
        them.
      </p>
      <div className="space-y-1">
        <label htmlFor="confirm-team-name" className="block font-medium">
          Type the team’s name to confirm
        </label>
        <input
          id="confirm-team-name"
          value={typed}
          onChange={(e) => setTyped(e.target.value)}
          autoComplete="off"
          className="w-full rounded-md border border-ink-faint bg-white px-3 py-2"
        />
      </div>
      {remove.isError && <Notice tone="error">{remove.error.message}</Notice>}
      <Button
        variant="danger"
        disabled={typed.trim() !== team.name || remove.isPending}
        onClick={() => remove.mutate()}
      >
        {remove.isPending ? 'Deleting…' : `Delete ${team.name}`}
      </Button>
    </div>
  );
}
