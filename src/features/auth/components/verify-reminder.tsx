import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { useResendVerification } from '../api/verify-email';

/** Shown to accounts whose address is not confirmed yet, with a way to get a new link. */
export function VerifyReminder({ email }: { email: string }) {
  const resend = useResendVerification();
  return (
    <Notice tone="warning">
      <p>
        Confirm your address ({email}) with the link we e-mailed you. Until then you cannot invite people or accept
        invitations.
      </p>
      {resend.isSuccess ? (
        <p className="mt-2 font-medium">A new link is on its way.</p>
      ) : (
        <Button variant="quiet" className="mt-2" onClick={() => resend.mutate()} disabled={resend.isPending}>
          Send the link again
        </Button>
      )}
      {resend.isError && <p className="mt-2 text-kiln">{resend.error.message}</p>}
    </Notice>
  );
}
