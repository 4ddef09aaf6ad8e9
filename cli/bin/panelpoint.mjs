#!/usr/bin/env node
// Entry point for `npx panelpoint`: runs the bundled program (rebuilt when sources change), or the
// TypeScript sources through tsx when PANELPOINT_FROM_SOURCE=1 or bundling is not possible.
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';

let main;
if (process.env.PANELPOINT_FROM_SOURCE !== '1') {
  try {
    const { ensureBundle } = await import('./bundle.mjs');
    const dir = await ensureBundle();
    process.env.PANELPOINT_WORKER_URL = pathToFileURL(join(dir, 'sweep-worker.mjs')).href;
    ({ main } = await import(pathToFileURL(join(dir, 'main.mjs')).href));
  } catch (e) {
    process.stderr.write(`panelpoint: running from source (${e instanceof Error ? e.message : e})\n`);
  }
}
if (!main) {
  const { register } = await import('tsx/esm/api');
  register();
  ({ main } = await import('../main.ts'));
}
process.exitCode = await main(process.argv);
