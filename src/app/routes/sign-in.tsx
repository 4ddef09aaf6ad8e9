import { Link } from 'react-router-dom';
import { SignInForm } from '@/features/auth/components/sign-in-form';

export function SignInPage() {
  return (
    <section aria-labelledby="sign-in-h">
      <h1 id="sign-in-h" className="mt-0 mb-3 text-lg font-semibold">Sign in to the team server</h1>
      <SignInForm />
      <p className="mt-3 text-xs text-ink-3">The <Link to="/examples" className="underline">example trusses</Link> need no account.</p>
    </section>
  );
}
