import { useNavigate } from 'react-router-dom';
import { Button } from '../../../components/ui/button';
import { useSignOutEverywhere } from '../api/sign-out-everywhere';

/** Ends every session of the account, on every device, this one included. */
export function SignOutEverywhere() {
  const signOut = useSignOutEverywhere();
  const navigate = useNavigate();
  return (
    <div className="space-y-2">
      <p className="text-ink-soft">
        Lost a phone, or signed in on a shared computer? This signs you out on every device, this one too.
      </p>
      <Button
        variant="danger"
        disabled={signOut.isPending}
        onClick={() => signOut.mutate(undefined, { onSuccess: () => navigate('/sign-in') })}
      >
        Sign out everywhere
      </Button>
      {signOut.isError && <p className="text-kiln">{signOut.error.message}</p>}
    </div>
  );
}
