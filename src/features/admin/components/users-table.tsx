/** Accounts with their global role and state; an administrator changes a role or disables an account here. */
import { useId } from 'react';
import type { PublicUser, Role } from '@/lib/api-types';
import { fmtWhen } from '@/lib/format';
import { FormError } from '@/components/form-error';
import { BTN, FIELD, TD, TH } from '@/components/ui';
import { useUpdateUser } from '../api/admin';

const ROLES: { role: Role; rights: string }[] = [
  { role: 'admin', rights: 'everything, in every project' },
  { role: 'engineer', rights: 'push runs, freeze cases, mark, reject, comment, upload, tokens' },
  { role: 'reviewer', rights: 'mark candidates, comment' },
  { role: 'viewer', rights: 'read' },
];

export function UsersTable({ users, meId }: { users: readonly PublicUser[]; meId?: number }) {
  const id = useId();
  const m = useUpdateUser();
  return (
    <>
      <table className="w-full border-collapse text-xs">
        <caption className="sr-only">User accounts</caption>
        <thead><tr className="border-b border-rule">
          <th scope="col" className={TH}>Name</th><th scope="col" className={TH}>Email</th><th scope="col" className={TH}>Global role</th>
          <th scope="col" className={TH}>Since</th><th scope="col" className={TH}>State</th>
        </tr></thead>
        <tbody>
          {users.map((u) => {
            const self = u.id === meId;
            return (
              <tr key={u.id} data-user={u.email} className={`border-b border-rule/60 ${u.disabled ? 'text-ink-3' : ''}`}>
                <th scope="row" className={`${TD} text-left font-medium`}>{u.name}{self && <span className="ml-1 font-normal text-ink-3">(you)</span>}</th>
                <td className={`${TD} num`}>{u.email}</td>
                <td className={TD}>
                  <label htmlFor={`${id}-${u.id}`} className="sr-only">Role of {u.name}</label>
                  <select id={`${id}-${u.id}`} value={u.role} disabled={self || m.isPending} title={self ? 'You cannot change your own role.' : undefined}
                    onChange={(e) => m.mutate({ id: u.id, patch: { role: e.target.value as Role } })} className={FIELD}>
                    {ROLES.map((r) => <option key={r.role} value={r.role}>{r.role}</option>)}
                  </select>
                </td>
                <td className={`${TD} num text-ink-2`}>{fmtWhen(u.createdAt)}</td>
                <td className={TD}>
                  <button type="button" className={BTN} disabled={self || m.isPending} aria-label={`${u.disabled ? 'Enable' : 'Disable'} ${u.name}`}
                    onClick={() => m.mutate({ id: u.id, patch: { disabled: !u.disabled } })}>
                    {u.disabled ? 'Enable' : 'Disable'}
                  </button>
                  {u.disabled && <span className="ml-2 text-warn">disabled</span>}
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
      {m.isError && <div className="px-3 pb-2"><FormError error={m.error} /></div>}
      <dl className="m-0 grid grid-cols-[auto_1fr] gap-x-3 border-t border-rule px-3 py-2 text-xs">
        {ROLES.map((r) => <div key={r.role} className="contents"><dt className="num text-ink">{r.role}</dt><dd className="m-0 text-ink-2">{r.rights}</dd></div>)}
      </dl>
    </>
  );
}
