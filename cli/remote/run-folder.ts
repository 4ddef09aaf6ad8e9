// What a push sends from a sweep's output folder: run.json, summary.json, the study file run.json
// names (checked against the run's study hash), the git commit of the study's folder, and where
// variants.jsonl is.
import { execFileSync } from 'node:child_process';
import { existsSync, readFileSync, statSync } from 'node:fs';
import { dirname, isAbsolute, join, resolve } from 'node:path';
import { InputError } from '../../shared/errors';
import type { Study } from '../../shared/schemas/study';
import { studyHash } from '../../shared/sweep/variant-id';
import { readJsonFile } from '../io/read-json';
import { FILES, type RunManifest } from '../sweep/run-dir';
import { VERSION } from '../context';
import type { RunLine } from './push-body';

/** A run folder ready to push. */
export interface RunFolder {
  run: RunLine;
  manifest: RunManifest;
  studyFile: string;
  jsonlPath: string;
  jsonlBytes: number;
  evaluated: number;
}

const refuse = (where: string, path: string, code: string, message: string) => new InputError(where, [{ path, code, message }]);

function readJson(dir: string, file: string): unknown {
  const p = join(dir, file);
  if (!existsSync(p)) throw refuse(dir, file, 'push-missing', `the folder has no ${file}; is it the --out folder of panelpoint sweep?`);
  try {
    return JSON.parse(readFileSync(p, 'utf8'));
  } catch (e) {
    throw refuse(dir, file, 'push-damaged', `cannot read it: ${(e as Error).message}`);
  }
}

/** The study file as recorded (from the working directory), else from the run folder. */
function findStudy(dir: string, recorded: string): string {
  const tries = isAbsolute(recorded) ? [recorded] : [resolve(recorded), resolve(dir, recorded)];
  const found = tries.find((p) => existsSync(p) && statSync(p).isFile());
  if (!found) throw refuse(join(dir, FILES.manifest), 'study.file', 'push-study-missing', `the study file ${recorded} of this run is not found (run the push from where the sweep ran)`);
  return found;
}

/** `git rev-parse HEAD` in the study's folder; null outside a repository or without git. */
export function gitCommit(folder: string): string | null {
  try {
    const out = execFileSync('git', ['rev-parse', 'HEAD'], { cwd: folder, encoding: 'utf8', stdio: ['ignore', 'pipe', 'ignore'], timeout: 5000 }).trim();
    return /^[0-9a-f]{7,64}$/.test(out) ? out : null;
  } catch {
    return null;
  }
}

/** Read a run folder for a push; InputError (exit 2) when it is not a finished or interrupted sweep. */
export function readRunFolder(dir: string): RunFolder {
  if (!existsSync(dir) || !statSync(dir).isDirectory()) throw refuse(dir, '', 'push-missing', 'no such run folder');
  const manifest = readJson(dir, FILES.manifest) as RunManifest;
  const summary = readJson(dir, FILES.summary) as { evaluated?: number };
  if (!manifest?.study?.hash || !manifest.shard || !manifest.range) throw refuse(dir, FILES.manifest, 'push-damaged', 'is not the run.json of a sweep');
  if (manifest.status === 'running') {
    throw refuse(dir, FILES.manifest, 'push-running', 'the sweep is still running, or was killed: let it finish, or continue it with panelpoint sweep --resume, then push');
  }
  const jsonlPath = join(dir, FILES.jsonl);
  if (!existsSync(jsonlPath)) throw refuse(dir, FILES.jsonl, 'push-missing', `the folder has no ${FILES.jsonl}`);
  const studyFile = findStudy(dir, manifest.study.file);
  const body = readJsonFile(studyFile).data as Study;
  const hash = studyHash(body);
  if (hash !== manifest.study.hash) {
    throw refuse(studyFile, '', 'push-other-study', `the study has changed since the run in ${dir} (hash ${hash}, the run has ${manifest.study.hash}); push needs the study as it was run`);
  }
  const run: RunLine = {
    kind: 'run', manifest, summary,
    study: { name: manifest.study.name, family: manifest.study.family, hash, body },
    cliVersion: VERSION, gitCommit: gitCommit(dirname(studyFile)),
  };
  return { run, manifest, studyFile, jsonlPath, jsonlBytes: statSync(jsonlPath).size, evaluated: Number(summary?.evaluated ?? 0) };
}
