/** The project's uploads, newest first, each a download link. */
import { useApi } from '@/lib/api-context';
import { fmtBytes, fmtWhen } from '@/lib/format';
import { QueryState } from '@/components/query-state';
import { LINK, TD, TH } from '@/components/ui';
import { useUploads } from '../api/uploads';

const KIND: Record<string, string> = { study: 'study', model: 'model', dxf: 'DXF' };

export function UploadsList({ slug }: { slug: string }) {
  const api = useApi();
  const q = useUploads(slug);
  return (
    <QueryState q={q} what="the uploads">
      {(list) => list.length === 0 ? <p className="m-0 px-3 py-2 text-xs text-ink-2">Nothing uploaded yet.</p> : (
        <table className="w-full border-collapse text-xs">
          <caption className="sr-only">Uploaded files</caption>
          <thead><tr className="border-b border-rule">
            <th scope="col" className={TH}>File</th><th scope="col" className={TH}>Kind</th><th scope="col" className={`${TH} text-right`}>Size</th>
            <th scope="col" className={TH}>By</th><th scope="col" className={TH}>When</th>
          </tr></thead>
          <tbody>
            {[...list].sort((a, b) => b.createdAt.localeCompare(a.createdAt)).map((u) => (
              <tr key={u.id} className="border-b border-rule/60">
                <th scope="row" className={`${TD} text-left font-normal`}>
                  <a href={api.uploadUrl(slug, u.id)} download={u.name} className={`num ${LINK}`}>{u.name}</a>
                </th>
                <td className={TD}>{KIND[u.kind] ?? u.kind}</td>
                <td className={`${TD} num text-right`}>{fmtBytes(u.size)}</td>
                <td className={TD}>{u.createdBy?.name ?? '—'}</td>
                <td className={`${TD} num text-ink-2`}>{fmtWhen(u.createdAt)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
    </QueryState>
  );
}
