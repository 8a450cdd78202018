import { useEffect, useRef } from 'react';
import { Link } from 'react-router-dom';
import { Notice } from '../../../components/ui/notice';
import { useVerifyEmail } from '../api/verify-email';

/** Confirms the address as soon as the page opens with a token, and says how it went. */
export function VerifyEmailStatus({ token }: { token: string | null }) {
  const verify = useVerifyEmail();
  const sent = useRef(false);
  useEffect(() => {
    // Once only: the token is single-use, and StrictMode runs effects twice in development.
    if (!token || sent.current) return;
    sent.current = true;
    verify.mutate(token);
  }, [token, verify]);

  if (!token) return <Notice tone="error">This link is incomplete. Open the link from the e-mail again.</Notice>;
  if (verify.isError) return <Notice tone="error">{verify.error.message}</Notice>;
  if (verify.isSuccess) {
    return (
      <Notice tone="success">
        Your address is confirmed. You can now invite people and accept invitations.{' '}
        <Link to="/team" className="underline">
          Go to your team
        </Link>
      </Notice>
    );
  }
  return <Notice>Confirming your address…</Notice>;
}
