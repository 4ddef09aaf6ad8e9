/** /reset-password: ask for a link, or (with ?token= from the mailed link) set a new password. */
import { Link, useSearchParams } from 'react-router-dom';
import { ResetConfirmForm, ResetRequestForm } from '@/features/auth/components/reset-forms';

export function ResetPasswordPage() {
  const [params] = useSearchParams();
  const token = params.get('token');
  return (
    <section aria-labelledby="reset-h">
      <h1 id="reset-h" className="mt-0 mb-1 text-lg font-semibold">{token ? 'Set a new password' : 'Reset your password'}</h1>
      <p className="mt-0 mb-3 max-w-sm text-xs text-ink-2">
        {token ? 'The link from the mail is good for one use.' : 'We mail a link to set a new password if an account has this address.'}
      </p>
      {token ? <ResetConfirmForm token={token} /> : <ResetRequestForm />}
      <p className="mt-3 text-xs text-ink-3"><Link to="/sign-in" className="underline">Back to sign in</Link></p>
    </section>
  );
}
