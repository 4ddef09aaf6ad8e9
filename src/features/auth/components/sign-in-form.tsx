/** The sign-in form: labelled fields, the server's message on failure, back to where the user was on success. */
import { useId, useState, type FormEvent } from 'react';
import { useNavigate, useSearchParams } from 'react-router-dom';
import { useSignIn } from '../api/sign-in';
import { errorMessage } from '@/lib/api-client';

const field = 'mt-1 block w-full rounded border border-rule-strong bg-sheet px-2 py-1.5 text-sm text-ink';

export function SignInForm() {
  const id = useId();
  const [email, setEmail] = useState('');
  const [password, setPassword] = useState('');
  const mutation = useSignIn();
  const navigate = useNavigate();
  const [params] = useSearchParams();
  const next = params.get('next');
  const onSubmit = (e: FormEvent) => {
    e.preventDefault();
    mutation.mutate({ email, password }, { onSuccess: () => navigate(next && next.startsWith('/') ? next : '/projects') });
  };
  return (
    <form onSubmit={onSubmit} className="max-w-sm rounded border border-rule bg-sheet p-4" aria-describedby={mutation.isError ? `${id}-err` : undefined}>
      <label htmlFor={`${id}-email`} className="block text-xs text-ink-2">Email</label>
      <input id={`${id}-email`} type="email" autoComplete="username" required value={email} onChange={(e) => setEmail(e.target.value)} className={field} />
      <label htmlFor={`${id}-password`} className="mt-3 block text-xs text-ink-2">Password</label>
      <input id={`${id}-password`} type="password" autoComplete="current-password" required value={password} onChange={(e) => setPassword(e.target.value)} className={field} />
      {mutation.isError && <p id={`${id}-err`} role="alert" className="mt-3 mb-0 text-sm text-bad">{errorMessage(mutation.error)}</p>}
      <button type="submit" disabled={mutation.isPending} className="mt-4 rounded bg-bar px-3 py-1.5 text-sm text-white disabled:opacity-60">
        {mutation.isPending ? 'Signing in…' : 'Sign in'}
      </button>
    </form>
  );
}
