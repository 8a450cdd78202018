import { useState } from 'react';
import { VerifyEmailStatus } from '../../features/auth/components/verify-email-status';
import { readLinkToken } from '../../lib/link-token';

/** The page the verification link opens. */
export function VerifyEmailRoute() {
  const [token] = useState(() => readLinkToken());
  return (
    <section className="max-w-xl space-y-6">
      <h1 className="text-title font-bold">Confirm your e-mail address</h1>
      <VerifyEmailStatus token={token} />
    </section>
  );
}
