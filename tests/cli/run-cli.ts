// Running `panelpoint` from tests: in-process through main() with collected streams, or as a
// real child process (exit codes and the bin script itself).
import { spawnSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { main } from '../../cli/main';
import type { Io } from '../../cli/context';

/** What one run of the program left behind. */
export interface CliRun {
  code: number;
  out: string;
  err: string;
}

/** The project folder (where package.json is). */
export const ROOT = fileURLToPath(new URL('../..', import.meta.url));

/** Path of an example model under examples/models. */
export const example = (name: string): string => `${ROOT}examples/models/${name}`;

/** Read and parse a JSON file. */
export const readJson = <T = unknown>(path: string): T => JSON.parse(readFileSync(path, 'utf8')) as T;

/** Run `panelpoint ARGS` in this process; stdout and stderr are collected, not printed. */
export async function runCli(...args: string[]): Promise<CliRun> {
  let out = '';
  let err = '';
  const io: Io = {
    out: (t) => {
      out += t;
    },
    err: (t) => {
      err += t;
    },
    isTTY: false,
  };
  const code = await main(['node', 'panelpoint', ...args], io);
  return { code, out, err };
}

/** Run `node cli/bin/panelpoint.mjs ARGS` as a real process from the project folder. */
export function runProcess(...args: string[]): CliRun {
  const r = spawnSync(process.execPath, ['cli/bin/panelpoint.mjs', ...args], { cwd: ROOT, encoding: 'utf8', timeout: 60_000 });
  if (r.error) throw r.error;
  return { code: r.status ?? -1, out: r.stdout, err: r.stderr };
}
