// Bundles the CLI and the sweep worker with esbuild into node_modules/.cache/panelpoint, rebuilt
// whenever a source file is newer. Running plain JavaScript keeps start-up fast (a worker thread
// otherwise loads every module through the TypeScript loader); npm packages stay external.
import { build } from 'esbuild';
import { mkdirSync, readdirSync, readFileSync, renameSync, statSync, existsSync, rmSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

const root = join(dirname(fileURLToPath(import.meta.url)), '..', '..');
const outDir = join(root, 'node_modules', '.cache', 'panelpoint');
const entries = { main: join(root, 'cli', 'main.ts'), 'sweep-worker': join(root, 'cli', 'worker', 'sweep-task.ts') };

function newestSource(dir) {
  let newest = 0;
  for (const e of readdirSync(dir, { withFileTypes: true })) {
    const p = join(dir, e.name);
    if (e.isDirectory()) newest = Math.max(newest, newestSource(p));
    else if (e.name.endsWith('.ts') && !e.name.endsWith('.test.ts')) newest = Math.max(newest, statSync(p).mtimeMs);
  }
  return newest;
}

function externals() {
  const pkg = JSON.parse(readFileSync(join(root, 'package.json'), 'utf8'));
  return Object.keys({ ...pkg.dependencies, ...pkg.devDependencies }).filter((d) => d !== 'mathjs').flatMap((d) => [d, `${d}/*`]);
}

/** @returns the folder holding main.mjs and sweep-worker.mjs, built if missing or stale */
export async function ensureBundle() {
  const stamp = join(outDir, 'main.mjs');
  const sources = Math.max(newestSource(join(root, 'cli')), newestSource(join(root, 'shared')), statSync(join(root, 'package.json')).mtimeMs, statSync(fileURLToPath(import.meta.url)).mtimeMs);
  if (existsSync(stamp) && existsSync(join(outDir, 'sweep-worker.mjs')) && statSync(stamp).mtimeMs >= sources) return outDir;
  const tmp = `${outDir}.tmp-${process.pid}`;
  mkdirSync(tmp, { recursive: true });
  await build({
    entryPoints: entries, outdir: tmp, outExtension: { '.js': '.mjs' }, bundle: true, platform: 'node', format: 'esm',
    // npm packages stay external, except mathjs: bundled, only the pieces shared/math.ts names are kept.
    target: 'node20', external: externals(), sourcemap: 'linked', logLevel: 'error', absWorkingDir: root,
  });
  mkdirSync(outDir, { recursive: true });
  // Worker first, main last: main.mjs's mtime marks a complete bundle.
  for (const f of ['sweep-worker.mjs.map', 'main.mjs.map']) if (existsSync(join(tmp, f))) renameSync(join(tmp, f), join(outDir, f));
  renameSync(join(tmp, 'sweep-worker.mjs'), join(outDir, 'sweep-worker.mjs'));
  renameSync(join(tmp, 'main.mjs'), join(outDir, 'main.mjs'));
  rmSync(tmp, { recursive: true, force: true });
  return outDir;
}
