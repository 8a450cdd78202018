import { useAccount } from '../../features/account/api/get-account';
import { ChangePasswordForm } from '../../features/account/components/change-password-form';
import { SignOutEverywhere } from '../../features/account/components/sign-out-everywhere';
import { UnitsChoice } from '../../features/account/components/units-choice';
import { VerifyReminder } from '../../features/auth/components/verify-reminder';
import { Notice } from '../../components/ui/notice';
import { RequireSignIn } from './require-sign-in';

function AccountPage() {
  const { data: account, isPending, isError, error } = useAccount();
  if (isPending) return <Notice>Loading your account…</Notice>;
  if (isError) return <Notice tone="error">{error.message}</Notice>;
  return (
    <div className="space-y-10">
      <header className="space-y-1">
        <h1 className="text-title font-bold">Your account</h1>
        <p className="text-ink-soft">
          {account.name} · <span className="break-all">{account.email}</span>
          {account.emailVerified ? ' · address confirmed' : ''}
        </p>
      </header>
      {!account.emailVerified && <VerifyReminder email={account.email} />}
      <section aria-labelledby="units" className="space-y-3">
        <h2 id="units" className="text-lead font-bold">
          Units
        </h2>
        <UnitsChoice />
      </section>
      <section aria-labelledby="password" className="space-y-3">
        <h2 id="password" className="text-lead font-bold">
          Change your password
        </h2>
        <ChangePasswordForm />
      </section>
      <section aria-labelledby="sessions" className="space-y-3">
        <h2 id="sessions" className="text-lead font-bold">
          Devices
        </h2>
        <SignOutEverywhere />
      </section>
    </div>
  );
}

/** Units for lengths, password change and signing out everywhere. */
export function AccountRoute() {
  return (
    <RequireSignIn>
      <AccountPage />
    </RequireSignIn>
  );
}
