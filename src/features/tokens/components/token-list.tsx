/** Tokens of the project (the caller's; every member's for a project admin): prefix, scopes, use, revoke with a confirmation. */
import { useState } from 'react';
import type { ApiTokenInfo } from '@/lib/api-types';
import { errorMessage } from '@/lib/api-client';
import { fmtWhen } from '@/lib/format';
import { BTN, TD, TH } from '@/components/ui';
import { useRevokeToken } from '../api/tokens';

function RevokeButton({ slug, token }: { slug: string; token: ApiTokenInfo }) {
  const [confirming, setConfirming] = useState(false);
  const m = useRevokeToken(slug);
  if (token.revokedAt) return <span className="text-ink-3">revoked {fmtWhen(token.revokedAt)}</span>;
  if (!confirming) return <button type="button" className={BTN} aria-label={`Revoke ${token.name}`} onClick={() => setConfirming(true)}>Revoke</button>;
  return (
    <span className="inline-flex items-center gap-1.5">
      <span className="text-bad">The CLI using it stops working.</span>
      <button type="button" className={`${BTN} border-bad text-bad`} disabled={m.isPending} onClick={() => m.mutate(token.id)} autoFocus>Revoke {token.name}</button>
      <button type="button" className={BTN} onClick={() => setConfirming(false)}>Keep</button>
      {m.isError && <span role="alert" className="text-bad">{errorMessage(m.error)}</span>}
    </span>
  );
}

export function TokenList({ slug, tokens }: { slug: string; tokens: readonly ApiTokenInfo[] }) {
  if (!tokens.length) return <p className="m-0 px-3 py-2 text-xs text-ink-2">No tokens yet.</p>;
  return (
    <table className="w-full border-collapse text-xs">
      <caption className="sr-only">API tokens</caption>
      <thead><tr className="border-b border-rule">
        <th scope="col" className={TH}>Name</th><th scope="col" className={TH}>Token</th><th scope="col" className={TH}>Scopes</th>
        <th scope="col" className={TH}>Owner</th><th scope="col" className={TH}>Created</th><th scope="col" className={TH}>Last used</th><th scope="col" className={TH}><span className="sr-only">Revoke</span></th>
      </tr></thead>
      <tbody>
        {tokens.map((t) => (
          <tr key={t.id} data-token={t.id} className={`border-b border-rule/60 ${t.revokedAt ? 'text-ink-3' : ''}`}>
            <th scope="row" className={`${TD} text-left font-medium`}>{t.name}</th>
            <td className={`${TD} num`}>pp_{t.prefix}_…</td>
            <td className={`${TD} num text-ink-2`}>{t.scopes.join(' ')}</td>
            <td className={TD}>{t.owner.name}</td>
            <td className={`${TD} num text-ink-2`}>{fmtWhen(t.createdAt)}</td>
            <td className={`${TD} num text-ink-2`}>{t.lastUsedAt ? fmtWhen(t.lastUsedAt) : 'never'}</td>
            <td className={`${TD} whitespace-nowrap`}><RevokeButton slug={slug} token={t} /></td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
