/** The sign-in form: labelled fields, the server's message on failure, back to where the user was on success. */
import { useId, useState, type FormEvent } from 'react';
import { Link, useNavigate, useSearchParams } from 'react-router-dom';
import { useSignIn } from '../api/sign-in';
import { FormError } from '@/components/form-error';
import { BTN_PRIMARY, FIELD_WIDE, LINK } from '@/components/ui';

/** Only same-site paths: a `next` of "//elsewhere" or "https://…" would leave the app. */
export const safeNext = (next: string | null) => (next && /^\/(?!\/)/.test(next) ? next : '/projects');

export function SignInForm() {
  const id = useId();
  const [email, setEmail] = useState('');
  const [password, setPassword] = useState('');
  const mutation = useSignIn();
  const navigate = useNavigate();
  const [params] = useSearchParams();
  const onSubmit = (e: FormEvent) => {
    e.preventDefault();
    mutation.mutate({ email, password }, { onSuccess: () => navigate(safeNext(params.get('next'))) });
  };
  return (
    <form onSubmit={onSubmit} className="max-w-sm rounded border border-rule bg-sheet p-4" aria-describedby={mutation.isError ? `${id}-err` : undefined}>
      <label htmlFor={`${id}-email`} className="block text-xs text-ink-2">Email</label>
      <input id={`${id}-email`} type="email" autoComplete="username" required value={email} onChange={(e) => setEmail(e.target.value)} className={FIELD_WIDE} />
      <label htmlFor={`${id}-password`} className="mt-3 block text-xs text-ink-2">Password</label>
      <input id={`${id}-password`} type="password" autoComplete="current-password" required value={password} onChange={(e) => setPassword(e.target.value)} className={FIELD_WIDE} />
      {mutation.isError && <FormError id={`${id}-err`} error={mutation.error} />}
      <div className="mt-4 flex items-center gap-4">
        <button type="submit" disabled={mutation.isPending} className={BTN_PRIMARY}>
          {mutation.isPending ? 'Signing in…' : 'Sign in'}
        </button>
        <Link to="/reset-password" className={`text-xs ${LINK}`}>Forgot the password?</Link>
      </div>
    </form>
  );
}
