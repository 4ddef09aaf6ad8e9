/**
 * Addresses of the app's pages. A run key may hold a slash (a sharded run: "<study hash>/<shards>"),
 * so it is always encoded; React Router decodes it again in useParams.
 */
const seg = encodeURIComponent;

export const projectPath = (slug: string) => `/projects/${seg(slug)}`;
export const runPath = (slug: string, runId: string) => `${projectPath(slug)}/runs/${seg(runId)}`;
export const variantPath = (slug: string, runId: string, index: number) => `${runPath(slug, runId)}/variants/${index}`;
export const comparePath = (slug: string, runId: string, indices: readonly number[]) => `${runPath(slug, runId)}/compare?v=${indices.join(',')}`;

/** A run key short enough for a table: a uuid's first 8 characters, or a shard key's hash start and shard count. */
export function shortRun(runId: string): string {
  const [hash, shards] = runId.split('/');
  return shards ? `${hash.slice(0, 8)}/${shards}` : runId.slice(0, 8);
}
