/**
 * Password reset: without a token, ask for the mailed link (the server answers the same whether
 * or not the account exists); with the token from the link, set a new password (10 to 72 characters).
 */
import { useId, useState, type FormEvent } from 'react';
import { Link } from 'react-router-dom';
import { useConfirmReset, useRequestReset } from '../api/password-reset';
import { FormError } from '@/components/form-error';
import { BTN_PRIMARY, FIELD_WIDE, LINK } from '@/components/ui';

const MIN = 10;
const MAX = 72;

export function ResetRequestForm() {
  const id = useId();
  const [email, setEmail] = useState('');
  const m = useRequestReset();
  const onSubmit = (e: FormEvent) => {
    e.preventDefault();
    m.mutate(email);
  };
  if (m.isSuccess) return <p role="status" className="max-w-sm rounded border border-rule bg-sheet p-4 text-sm">{m.data.message}</p>;
  return (
    <form onSubmit={onSubmit} className="max-w-sm rounded border border-rule bg-sheet p-4">
      <label htmlFor={`${id}-email`} className="block text-xs text-ink-2">Email of the account</label>
      <input id={`${id}-email`} type="email" autoComplete="username" required value={email} onChange={(e) => setEmail(e.target.value)} className={FIELD_WIDE} />
      {m.isError && <FormError error={m.error} />}
      <button type="submit" disabled={m.isPending} className={`mt-4 ${BTN_PRIMARY}`}>{m.isPending ? 'Sending…' : 'Mail me a reset link'}</button>
    </form>
  );
}

export function ResetConfirmForm({ token }: { token: string }) {
  const id = useId();
  const [password, setPassword] = useState('');
  const [again, setAgain] = useState('');
  const [mismatch, setMismatch] = useState(false);
  const m = useConfirmReset();
  const onSubmit = (e: FormEvent) => {
    e.preventDefault();
    setMismatch(password !== again);
    if (password === again) m.mutate({ token, password });
  };
  if (m.isSuccess) {
    return <p role="status" className="max-w-sm rounded border border-rule bg-sheet p-4 text-sm">The password is changed. <Link to="/sign-in" className={LINK}>Sign in</Link> with it.</p>;
  }
  return (
    <form onSubmit={onSubmit} className="max-w-sm rounded border border-rule bg-sheet p-4">
      <label htmlFor={`${id}-pw`} className="block text-xs text-ink-2">New password</label>
      <input id={`${id}-pw`} type="password" autoComplete="new-password" required minLength={MIN} maxLength={MAX} value={password}
        onChange={(e) => setPassword(e.target.value)} aria-describedby={`${id}-hint`} className={FIELD_WIDE} />
      <p id={`${id}-hint`} className="mt-1 mb-0 text-xs text-ink-3">{MIN} to {MAX} characters.</p>
      <label htmlFor={`${id}-again`} className="mt-3 block text-xs text-ink-2">The same again</label>
      <input id={`${id}-again`} type="password" autoComplete="new-password" required value={again} onChange={(e) => setAgain(e.target.value)} className={FIELD_WIDE} />
      {mismatch && <p role="alert" className="mt-3 mb-0 text-sm text-bad">The two passwords differ.</p>}
      {m.isError && <FormError error={m.error} />}
      <button type="submit" disabled={m.isPending} className={`mt-4 ${BTN_PRIMARY}`}>{m.isPending ? 'Saving…' : 'Set the password'}</button>
    </form>
  );
}
