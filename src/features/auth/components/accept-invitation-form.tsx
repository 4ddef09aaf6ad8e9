/**
 * Accept an invitation with the token from the mailed link. Someone who already has an account
 * with the invited email just accepts; a new person gives a name and a password.
 */
import { useId, useState, type FormEvent } from 'react';
import { useNavigate } from 'react-router-dom';
import { useAcceptInvitation } from '../api/accept-invitation';
import { FormError } from '@/components/form-error';
import { BTN_PRIMARY, FIELD_WIDE } from '@/components/ui';

export function AcceptInvitationForm({ token }: { token: string }) {
  const id = useId();
  const [isNew, setIsNew] = useState(false);
  const [name, setName] = useState('');
  const [password, setPassword] = useState('');
  const m = useAcceptInvitation();
  const navigate = useNavigate();
  const onSubmit = (e: FormEvent) => {
    e.preventDefault();
    m.mutate(isNew ? { token, name, password } : { token }, { onSuccess: (a) => navigate(`/projects/${a.project.slug}`) });
  };
  return (
    <form onSubmit={onSubmit} className="max-w-sm rounded border border-rule bg-sheet p-4">
      <fieldset className="m-0 border-0 p-0">
        <legend className="mb-1 text-xs text-ink-2">Your account</legend>
        <label className="flex items-center gap-2 text-sm"><input type="radio" name={`${id}-who`} checked={!isNew} onChange={() => setIsNew(false)} /> I have an account with the invited email</label>
        <label className="mt-1 flex items-center gap-2 text-sm"><input type="radio" name={`${id}-who`} checked={isNew} onChange={() => setIsNew(true)} /> I am new here: create my account</label>
      </fieldset>
      {isNew && (
        <>
          <label htmlFor={`${id}-name`} className="mt-3 block text-xs text-ink-2">Your name</label>
          <input id={`${id}-name`} autoComplete="name" required maxLength={120} value={name} onChange={(e) => setName(e.target.value)} className={FIELD_WIDE} />
          <label htmlFor={`${id}-pw`} className="mt-3 block text-xs text-ink-2">Password (10 to 72 characters)</label>
          <input id={`${id}-pw`} type="password" autoComplete="new-password" required minLength={10} maxLength={72} value={password} onChange={(e) => setPassword(e.target.value)} className={FIELD_WIDE} />
        </>
      )}
      {m.isError && <FormError error={m.error} />}
      <button type="submit" disabled={m.isPending} className={`mt-4 ${BTN_PRIMARY}`}>{m.isPending ? 'Joining…' : 'Accept the invitation'}</button>
    </form>
  );
}
