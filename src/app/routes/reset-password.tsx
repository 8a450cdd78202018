import { useState } from 'react';
import { ResetConfirmForm } from '../../features/auth/components/reset-confirm-form';
import { ResetRequestForm } from '../../features/auth/components/reset-request-form';
import { readLinkToken } from '../../lib/link-token';

/** Without a token: ask for a reset link. With the token from the link: choose the new password. */
export function ResetPasswordRoute() {
  const [token] = useState(() => readLinkToken());
  return (
    <section className="max-w-md space-y-6">
      <h1 className="text-title font-bold">{token ? 'Choose a new password' : 'Reset your password'}</h1>
      {token ? (
        <ResetConfirmForm token={token} />
      ) : (
        <>
          <p className="text-ink-soft">We will e-mail you a link to choose a new password.</p>
          <ResetRequestForm />
        </>
      )}
    </section>
  );
}
