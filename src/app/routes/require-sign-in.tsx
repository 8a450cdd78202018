import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { Notice } from '../../components/ui/notice';
import { useMe } from '../../lib/session';

/** Renders its children for signed-in users; others get a way to sign in. */
export function RequireSignIn({ children }: { children: ReactNode }) {
  const { data: me, isPending, isError, error } = useMe();
  if (isPending) return <Notice>Loading…</Notice>;
  if (isError) return <Notice tone="error">{error.message}</Notice>;
  if (!me) {
    return (
      <div className="space-y-4">
        <h1 className="text-title font-bold">Sign in to continue</h1>
        <Notice>
          <Link to="/sign-in" className="font-medium underline">
            Sign in
          </Link>{' '}
          to see this page.
        </Notice>
      </div>
    );
  }
  return <>{children}</>;
}
