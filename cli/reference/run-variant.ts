// `RUN:VARIANT` for `panelpoint freeze`: a sweep output folder (run.json names the study file and
// its hash) and a variant index or id; the variant's parameters come from its variants.jsonl line
// and its model is rebuilt from the study's family, loads and combinations.
import { closeSync, existsSync, openSync, readSync, statSync } from 'node:fs';
import { isAbsolute, join, resolve } from 'node:path';
import { InputError } from '../../shared/errors';
import type { Model } from '../../shared/schemas/model';
import type { Params } from '../../shared/sweep/types';
import { variantModel } from '../../shared/reference/variant-model';
import { FILES, readManifest, type RunManifest } from '../sweep/run-dir';
import { loadStudyFile } from '../sweep/load-study';

/** One line of variants.jsonl (the keys read here). */
export interface VariantLine { index: number; id: string; params: Params; status: string; k: number; s: number; reason?: string | null; peakTension?: Peak | null; peakCompression?: Peak | null }
interface Peak { value: number; member: string; combination: string }

/** A variant of a run, rebuilt. */
export interface RunVariant { dir: string; manifest: RunManifest; studyFile: string; line: VariantLine; model: Model }

const problem = (where: string, path: string, code: string, message: string) => new InputError(where, [{ path, code, message }]);

/** Split `RUN:VARIANT` at its last colon; undefined when there is no colon. */
export function splitRunVariant(arg: string): { dir: string; variant: string } | undefined {
  const at = arg.lastIndexOf(':');
  return at > 0 && at < arg.length - 1 ? { dir: arg.slice(0, at), variant: arg.slice(at + 1) } : undefined;
}

/** The first line of a JSON Lines file for which `match` holds, read in chunks (runs can be large). */
function findLine(path: string, match: (line: string) => boolean): string | undefined {
  const fd = openSync(path, 'r');
  try {
    const size = statSync(path).size;
    const buf = Buffer.allocUnsafe(1 << 22);
    let pos = 0;
    let carry = '';
    while (pos < size) {
      const n = readSync(fd, buf, 0, buf.length, pos);
      if (n <= 0) break;
      pos += n;
      const parts = (carry + buf.toString('utf8', 0, n)).split('\n');
      carry = parts.pop()!;
      const hit = parts.find(match);
      if (hit !== undefined) return hit;
    }
    return carry && match(carry) ? carry : undefined;
  } finally {
    closeSync(fd);
  }
}

/** The study file a run names: as recorded (from the working directory), else from the run folder. */
function studyPath(dir: string, m: RunManifest): string {
  const recorded = m.study.file;
  const tries = isAbsolute(recorded) ? [recorded] : [resolve(recorded), resolve(dir, recorded)];
  const found = tries.find((p) => existsSync(p));
  if (!found) throw problem(join(dir, FILES.manifest), 'study.file', 'run-study-missing', `the study file ${recorded} of this run is not found`);
  return found;
}

/**
 * Rebuild variant `variant` (0-based index or 16-hex-digit id) of the sweep in `dir`.
 * @throws InputError when the folder holds no run, the study changed since, or the variant is not in it
 */
export function loadRunVariant(dir: string, variant: string): RunVariant {
  const manifest = readManifest(dir);
  if (!manifest) throw problem(dir, '', 'run-missing', `not a sweep output folder (no ${FILES.manifest})`);
  const studyFile = studyPath(dir, manifest);
  const study = loadStudyFile(studyFile);
  if (study.hash !== manifest.study.hash)
    throw problem(studyFile, '', 'run-other-study', `the study has changed since the run in ${dir} (hash ${study.hash}, the run has ${manifest.study.hash})`);
  const byId = /^[0-9a-f]{16}$/.test(variant);
  if (!byId && !/^\d+$/.test(variant)) throw problem(dir, '', 'run-variant', `'${variant}' is neither a variant index (0, 1, ...) nor a 16-hex-digit id`);
  const needle = byId ? `"id":"${variant}"` : `{"index":${Number(variant)},`;
  const text = findLine(join(dir, FILES.jsonl), byId ? (l) => l.includes(needle) : (l) => l.startsWith(needle));
  if (text === undefined) {
    const { start, end } = manifest.range;
    throw problem(join(dir, FILES.jsonl), '', 'run-variant', `variant ${variant} is not in this run (indices ${start}..${end - 1}, or dropped by the study's where filters)`);
  }
  const line = JSON.parse(text) as VariantLine;
  if (line.status === 'error') throw problem(join(dir, FILES.jsonl), '', 'run-variant', `variant ${variant} failed in the sweep: ${line.reason ?? 'no reason given'}`);
  const name = `${manifest.study.name}, variant ${line.index} (${line.id})`;
  return { dir, manifest, studyFile, line, model: variantModel(study.setup, study.combinations, line.params, name) };
}
