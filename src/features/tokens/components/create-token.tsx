/**
 * Create a token: a name and its scopes (only rights the creator holds in the project). The
 * secret is shown once, right here, with a copy button; dismissing it forgets it.
 */
import { useId, useState, type FormEvent } from 'react';
import type { CreatedToken, ProjectRight } from '@/lib/api-types';
import { FormError } from '@/components/form-error';
import { BTN, BTN_PRIMARY, FIELD } from '@/components/ui';
import { useCreateToken } from '../api/tokens';

/** Rights a token may carry (server/auth/rights.ts TOKEN_SCOPES), with what each lets the CLI do. */
export const SCOPES: { scope: ProjectRight; label: string }[] = [
  { scope: 'project:read', label: 'read the project' },
  { scope: 'runs:push', label: 'push runs' },
  { scope: 'cases:freeze', label: 'freeze cases and record checks' },
  { scope: 'variants:mark', label: 'mark candidates' },
  { scope: 'variants:reject', label: 'reject variants' },
  { scope: 'comments:write', label: 'comment' },
];

function NewSecret({ token, onDone }: { token: CreatedToken; onDone: () => void }) {
  const [copied, setCopied] = useState('');
  const copy = async () => {
    try {
      await navigator.clipboard.writeText(token.token);
      setCopied('Copied.');
    } catch {
      setCopied('Select the text and copy it by hand.');
    }
  };
  return (
    <div role="alert" data-testid="new-token" className="mx-3 my-2 rounded border border-warn bg-paper p-2 text-xs">
      <p className="m-0 font-medium text-ink">Token "{token.name}" created. Copy it now: it is shown this once and cannot be read again.</p>
      <p className="m-0 mt-1 flex flex-wrap items-center gap-2">
        <code className="num select-all break-all rounded border border-rule-strong bg-sheet px-1.5 py-0.5 text-[12px]">{token.token}</code>
        <button type="button" className={BTN} onClick={() => void copy()}>Copy</button>
        <span role="status" className="text-ink-2">{copied}</span>
        <button type="button" className={`ml-auto ${BTN}`} onClick={onDone}>I have copied it</button>
      </p>
      <p className="m-0 mt-1 text-ink-2">Use it with the CLI: <span className="num">PANELPOINT_TOKEN=… panelpoint push</span>.</p>
    </div>
  );
}

export function CreateToken({ slug, rights }: { slug: string; rights: readonly ProjectRight[] }) {
  const id = useId();
  const held = SCOPES.filter((s) => rights.includes(s.scope));
  const [name, setName] = useState('');
  const [scopes, setScopes] = useState<ProjectRight[]>(held.filter((s) => s.scope === 'project:read' || s.scope === 'runs:push').map((s) => s.scope));
  const [created, setCreated] = useState<CreatedToken>();
  const m = useCreateToken(slug);
  const submit = (e: FormEvent) => {
    e.preventDefault();
    m.mutate({ name: name.trim(), scopes }, { onSuccess: (t) => { setCreated(t); setName(''); } });
  };
  return (
    <>
      {created && <NewSecret token={created} onDone={() => { setCreated(undefined); m.reset(); }} />}
      <form onSubmit={submit} className="flex flex-wrap items-end gap-x-4 gap-y-2 px-3 py-2 text-xs">
        <div>
          <label htmlFor={`${id}-name`} className="block text-ink-2">Name</label>
          <input id={`${id}-name`} required maxLength={100} value={name} placeholder="laptop CLI" onChange={(e) => setName(e.target.value)} className={`mt-1 w-48 ${FIELD}`} />
        </div>
        <fieldset className="m-0 border-0 p-0">
          <legend className="text-ink-2">Scopes</legend>
          <div className="mt-1 flex flex-wrap gap-x-3 gap-y-1">
            {SCOPES.map((s) => {
              const allowed = rights.includes(s.scope);
              return (
                <label key={s.scope} className={`inline-flex items-center gap-1 ${allowed ? '' : 'text-ink-3'}`} title={allowed ? undefined : 'You do not hold this right in the project.'}>
                  <input type="checkbox" disabled={!allowed} checked={scopes.includes(s.scope)}
                    onChange={(e) => setScopes((c) => (e.target.checked ? [...c, s.scope] : c.filter((x) => x !== s.scope)))} />
                  <span className="num">{s.scope}</span> <span className="text-ink-3">{s.label}</span>
                </label>
              );
            })}
          </div>
        </fieldset>
        <button type="submit" disabled={m.isPending || !name.trim() || !scopes.length} className={BTN_PRIMARY}>{m.isPending ? 'Creating…' : 'Create token'}</button>
        {m.isError && <div className="basis-full"><FormError error={m.error} /></div>}
      </form>
    </>
  );
}
