import { Link, useNavigate } from 'react-router-dom';
import { SignUpForm } from '../../features/auth/components/sign-up-form';
import { pendingInvitation } from '../../lib/link-token';

/** Create an account; a pending invitation is picked up right after. */
export function SignUpRoute() {
  const navigate = useNavigate();
  return (
    <section className="max-w-md space-y-6">
      <h1 className="text-title font-bold">Create your Seamwright account</h1>
      <p className="text-ink-soft">
        The joint generator works without an account. An account keeps presets, printer profiles and kit history for you
        and your team.
      </p>
      <SignUpForm onDone={() => navigate(pendingInvitation() ? '/invitations/accept' : '/team')} />
      <p>
        Already have an account?{' '}
        <Link to="/sign-in" className="font-medium underline">
          Sign in
        </Link>
      </p>
    </section>
  );
}
