// A sweep's output folder: run.json (what was run), variants.jsonl, variants.csv, summary.json.
// Results are appended in index order, so a killed run leaves a clean prefix that --resume extends.
import { closeSync, existsSync, ftruncateSync, mkdirSync, openSync, readFileSync, readSync, fstatSync, writeSync } from 'node:fs';
import { join } from 'node:path';
import { StringDecoder } from 'node:string_decoder';
import { InputError } from '../../shared/errors';
import { addToSummary, emptySummary, summaryInputFromJson, type Objective, type SweepSummary } from '../../shared/sweep/summary';
import { writeFileAtomic } from '../io/write-atomic';

/** What run.json holds. */
export interface RunManifest {
  panelpoint: string;
  runId: string;
  study: { name: string; family: string; hash: string; file: string };
  shard: { index: number; count: number };
  /** Variant indices of this run: [start, end) of the study's space. */
  range: { start: number; end: number };
  spaceSize: number;
  paramNames: string[];
  combinations: { id: string; factors: Record<string, number>; source: string }[];
  units: { force: 'kN'; length: 'm' };
  objective: Objective;
  status: 'running' | 'complete' | 'interrupted';
  startedAt: string;
  finishedAt?: string;
  /** Variants of the range already evaluated: the next index to run is range.start + done. */
  nextIndex: number;
}

export const FILES = { manifest: 'run.json', jsonl: 'variants.jsonl', csv: 'variants.csv', summary: 'summary.json' } as const;

/** Open appendable result files. */
export class ResultWriter {
  private readonly jsonl: number;
  private readonly csv: number;
  constructor(readonly dir: string) {
    this.jsonl = openSync(join(dir, FILES.jsonl), 'a');
    this.csv = openSync(join(dir, FILES.csv), 'a');
  }
  append(jsonl: Uint8Array, csv: Uint8Array): void {
    if (jsonl.length) writeSync(this.jsonl, jsonl);
    if (csv.length) writeSync(this.csv, csv);
  }
  close(): void {
    closeSync(this.jsonl);
    closeSync(this.csv);
  }
}

export function readManifest(dir: string): RunManifest | undefined {
  const p = join(dir, FILES.manifest);
  return existsSync(p) ? (JSON.parse(readFileSync(p, 'utf8')) as RunManifest) : undefined;
}

export function writeManifest(dir: string, m: RunManifest): void {
  writeFileAtomic(join(dir, FILES.manifest), JSON.stringify(m, null, 2) + '\n');
}

export function writeSummary(dir: string, s: unknown): void {
  writeFileAtomic(join(dir, FILES.summary), JSON.stringify(s, null, 2) + '\n');
}

/** Make a fresh run folder; refuse one that already holds a run. */
export function freshRunDir(dir: string, csvHeader: string): void {
  if (existsSync(join(dir, FILES.manifest)) || existsSync(join(dir, FILES.jsonl))) {
    throw new InputError(dir, [{ path: '', code: 'run-exists', message: 'this folder already holds a run; add --resume to continue it, or choose another --out' }]);
  }
  mkdirSync(dir, { recursive: true });
  writeFileAtomic(join(dir, FILES.jsonl), '');
  writeFileAtomic(join(dir, FILES.csv), csvHeader);
}

/**
 * Prepare a folder for --resume: cut any half-written last line, cut JSONL and CSV back to the
 * rows both hold (a run killed between the two writes leaves the CSV behind), and rebuild the
 * summary from what is on disk.
 * @returns the summary so far, the index of the last variant kept (−1 when none), and the count
 */
export function scanForResume(dir: string, objective: Objective): { summary: SweepSummary; lastIndex: number; lines: number } {
  const summary = emptySummary(objective);
  const jpath = join(dir, FILES.jsonl);
  const cpath = join(dir, FILES.csv);
  const csvRows = Math.max(0, countCompleteLines(cpath) - 1);
  const fd = openSync(jpath, 'r+');
  let lastIndex = -1;
  let lines = 0;
  let keep = 0;
  try {
    const size = fstatSync(fd).size;
    const buf = Buffer.allocUnsafe(1 << 22);
    const decoder = new StringDecoder('utf8'); // a character split across two reads stays whole
    let pos = 0;
    let carry = '';
    outer: while (pos < size) {
      const n = readSync(fd, buf, 0, buf.length, pos);
      pos += n;
      const text = carry + decoder.write(buf.subarray(0, n));
      const parts = text.split('\n');
      carry = parts.pop()!;
      for (const line of parts) {
        if (lines === csvRows) break outer;
        let o: Record<string, unknown>;
        try {
          o = JSON.parse(line) as Record<string, unknown>;
        } catch {
          throw new InputError(jpath, [{ path: `line ${lines + 1}`, code: 'run-damaged', message: 'is not valid JSON; the run cannot be resumed (start it again in a new folder)' }]);
        }
        addToSummary(summary, summaryInputFromJson(o));
        lastIndex = o.index as number;
        lines++;
        keep += Buffer.byteLength(line) + 1;
      }
    }
    ftruncateSync(fd, keep);
  } finally {
    closeSync(fd);
  }
  truncateLines(cpath, lines + 1);
  return { summary, lastIndex, lines };
}

function countCompleteLines(path: string): number {
  const fd = openSync(path, 'r');
  try {
    const buf = Buffer.allocUnsafe(1 << 22);
    let count = 0;
    for (let pos = 0, n = 0; (n = readSync(fd, buf, 0, buf.length, pos)) > 0; pos += n) {
      for (let i = 0; i < n; i++) if (buf[i] === 10) count++;
    }
    return count;
  } finally {
    closeSync(fd);
  }
}

/** Keep the first `count` lines of a file. */
function truncateLines(path: string, count: number): void {
  const fd = openSync(path, 'r+');
  try {
    const size = fstatSync(fd).size;
    const buf = Buffer.allocUnsafe(1 << 22);
    let pos = 0;
    let seen = 0;
    while (pos < size && seen < count) {
      const n = readSync(fd, buf, 0, buf.length, pos);
      for (let i = 0; i < n; i++) {
        if (buf[i] === 10 && ++seen === count) {
          ftruncateSync(fd, pos + i + 1);
          return;
        }
      }
      pos += n;
    }
    if (seen < count) throw new InputError(path, [{ path: '', code: 'run-damaged', message: `holds ${seen} lines where ${count} were expected; the run cannot be resumed` }]);
  } finally {
    closeSync(fd);
  }
}
