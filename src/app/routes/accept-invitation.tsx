/** /invitations/accept?token=: join a project from a mailed invitation. */
import { Link, useSearchParams } from 'react-router-dom';
import { AcceptInvitationForm } from '@/features/auth/components/accept-invitation-form';

export function AcceptInvitationPage() {
  const [params] = useSearchParams();
  const token = params.get('token');
  return (
    <section aria-labelledby="invite-h">
      <h1 id="invite-h" className="mt-0 mb-3 text-lg font-semibold">Join a project</h1>
      {token ? <AcceptInvitationForm token={token} /> : (
        <p role="alert" className="max-w-sm text-sm text-bad">This address has no invitation token. Open the link from the invitation mail again, or ask for a new invitation.</p>
      )}
      <p className="mt-3 text-xs text-ink-3">Already a member? <Link to="/sign-in" className="underline">Sign in</Link>.</p>
    </section>
  );
}
