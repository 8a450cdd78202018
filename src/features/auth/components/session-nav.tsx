import { useId } from 'react';
import { Link, useNavigate } from 'react-router-dom';
import { useCurrentTeam, useMe } from '../../../lib/session';
import { useSignOut } from '../api/sign-out';

/** The right side of the header: sign-in links, or the user, their current team with a switcher, and sign out. */
export function SessionNav() {
  const { data: me, isPending } = useMe();
  const { team, teams, switchTo } = useCurrentTeam();
  const switcherId = useId();
  const signOut = useSignOut();
  const navigate = useNavigate();
  if (isPending) return null;
  if (!me) {
    return (
      <div className="flex gap-2">
        <Link to="/sign-in" className="rounded-md px-3 py-2 font-medium hover:bg-paper-deep">
          Sign in
        </Link>
        <Link to="/sign-up" className="rounded-md bg-kiln px-3 py-2 font-medium text-white hover:bg-ink">
          Create account
        </Link>
      </div>
    );
  }
  return (
    <div className="flex flex-wrap items-center gap-3">
      {/* A label beside the select (not around it), so the select's name is "Team", not its current value too. */}
      <div className="flex items-center gap-2 text-sm">
        <label htmlFor={switcherId} className="text-ink-soft">
          Team
        </label>
        <select
          id={switcherId}
          value={team?.id ?? ''}
          onChange={(e) => switchTo(e.target.value)}
          className="rounded-md border border-ink-faint bg-white px-2 py-1 text-ink"
        >
          {teams.map((t) => (
            <option key={t.id} value={t.id}>
              {t.name} ({t.role})
            </option>
          ))}
        </select>
      </div>
      <Link to="/account" className="font-medium underline-offset-4 hover:underline" title={me.user.email}>
        {me.user.name}
      </Link>
      <button
        type="button"
        className="rounded-md px-3 py-2 text-sm font-medium hover:bg-paper-deep"
        onClick={() => signOut.mutate(false, { onSuccess: () => navigate('/') })}
      >
        Sign out
      </button>
    </div>
  );
}
