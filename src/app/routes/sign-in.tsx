import { Link, useNavigate } from 'react-router-dom';
import { SignInForm } from '../../features/auth/components/sign-in-form';
import { pendingInvitation } from '../../lib/link-token';

/** Sign in; a pending invitation is picked up right after. */
export function SignInRoute() {
  const navigate = useNavigate();
  return (
    <section className="max-w-md space-y-6">
      <h1 className="text-title font-bold">Sign in</h1>
      <SignInForm onDone={() => navigate(pendingInvitation() ? '/invitations/accept' : '/team')} />
      <p>
        <Link to="/reset-password" className="font-medium underline">
          Forgot your password?
        </Link>
      </p>
      <p>
        New here?{' '}
        <Link to="/sign-up" className="font-medium underline">
          Create an account
        </Link>
      </p>
    </section>
  );
}
