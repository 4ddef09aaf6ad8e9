// Join the run folders of a sharded sweep into one: shards checked against each other first,
// results concatenated in index order, the summary rebuilt from the JSON Lines. Everything is
// written into a temporary folder beside --out and renamed at the end, so a failed merge leaves nothing.
import { closeSync, existsSync, fstatSync, fsyncSync, mkdirSync, openSync, readdirSync, readFileSync, readSync, renameSync, rmSync, statSync, writeSync } from 'node:fs';
import { basename, dirname, join, resolve } from 'node:path';
import { randomBytes, randomUUID } from 'node:crypto';
import { InputError } from '../../shared/errors';
import { shardRange } from '../../shared/sweep/shard';
import { addToSummary, emptySummary, summaryInputFromJson, type SweepSummary } from '../../shared/sweep/summary';
import { FILES, writeManifest, writeSummary, type RunManifest } from './run-dir';

/** One shard's place in a merged run. */
export interface MergedShard { dir: string; runId: string; shard: { index: number; count: number }; range: { start: number; end: number }; variants: number }

/** run.json of a merged run: one shard covering the union of the shards it was made from. */
export interface MergedManifest extends Omit<RunManifest, 'status'> {
  status: 'complete' | 'partial';
  mergedAt: string;
  mergedFrom: MergedShard[];
  /** Shards not given to the merge (only when partial): their number and index range. */
  missing?: { shard: number; start: number; end: number }[];
}

/** What a merge wrote. */
export interface MergeResult { manifest: MergedManifest; summary: SweepSummary; seconds: number; doc: Record<string, unknown> }

interface ShardIn { dir: string; manifest: RunManifest; seconds: number; startupSeconds: number }

const refuse = (dir: string, path: string, code: string, message: string) => new InputError(dir, [{ path, code, message }]);

function readShard(dir: string): ShardIn {
  if (!existsSync(dir) || !statSync(dir).isDirectory()) throw refuse(dir, '', 'shard-missing', 'no such run folder');
  for (const f of Object.values(FILES)) if (!existsSync(join(dir, f))) throw refuse(dir, f, 'shard-incomplete', `the folder has no ${f}; is it a sweep's --out folder?`);
  const read = (f: string) => {
    try {
      return JSON.parse(readFileSync(join(dir, f), 'utf8')) as Record<string, unknown>;
    } catch (e) {
      throw refuse(dir, f, 'shard-damaged', `cannot read it: ${(e as Error).message}`);
    }
  };
  const manifest = read(FILES.manifest) as unknown as RunManifest;
  if (!manifest.study?.hash || !manifest.shard || !manifest.range) throw refuse(dir, FILES.manifest, 'shard-damaged', 'is not the run.json of a sweep');
  if (manifest.status !== 'complete') {
    throw refuse(dir, FILES.manifest, 'shard-not-complete', `status is '${manifest.status}', not 'complete'; finish it first with panelpoint sweep --resume`);
  }
  const { seconds, startupSeconds } = read(FILES.summary);
  const num = (v: unknown) => (typeof v === 'number' ? v : 0);
  return { dir, manifest, seconds: num(seconds), startupSeconds: num(startupSeconds) };
}

/** Check the shards against each other; @returns them in index order */
function checkShards(shards: ShardIn[]): ShardIn[] {
  const [first] = shards;
  const seen = new Map<number, string>();
  for (const s of shards) {
    const m = s.manifest;
    if (m.study.hash !== first.manifest.study.hash) {
      throw refuse(s.dir, 'run.json study.hash', 'shard-other-study', `is a run of another study (or an edited one): hash ${m.study.hash} ('${m.study.name}'), where ${first.dir} has ${first.manifest.study.hash} ('${first.manifest.study.name}')`);
    }
    if (m.shard.count !== first.manifest.shard.count) {
      throw refuse(s.dir, 'run.json shard', 'shard-other-count', `is shard ${m.shard.index}/${m.shard.count}, where ${first.dir} is one of ${first.manifest.shard.count} shards`);
    }
    const twice = seen.get(m.shard.index);
    if (twice !== undefined) throw refuse(s.dir, 'run.json shard', 'shard-twice', `holds shard ${m.shard.index}/${m.shard.count}, as does ${twice}`);
    seen.set(m.shard.index, s.dir);
    const want = shardRange(m.spaceSize, m.shard.index, m.shard.count);
    if (m.range.start !== want.start || m.range.end !== want.end) {
      throw refuse(s.dir, 'run.json range', 'shard-damaged', `covers ${m.range.start}..${m.range.end - 1}, but shard ${m.shard.index}/${m.shard.count} of ${m.spaceSize} variants is ${want.start}..${want.end - 1}`);
    }
  }
  return [...shards].sort((a, b) => a.manifest.range.start - b.manifest.range.start);
}

/** Buffered appends to a file descriptor: one write per 4 MiB rather than one per line. */
class Sink {
  private readonly buf = Buffer.allocUnsafe(1 << 22);
  private len = 0;
  constructor(readonly fd: number) {}
  write(src: Buffer, start: number, end: number): void {
    if (this.len + end - start > this.buf.length) this.flush();
    if (end - start > this.buf.length) writeSync(this.fd, src, start, end - start);
    else this.len += src.copy(this.buf, this.len, start, end);
  }
  flush(): void {
    if (this.len) writeSync(this.fd, this.buf, 0, this.len);
    this.len = 0;
  }
}

/** Call `line(bytes, start, end)` for every line of a file (without its newline); @returns the byte length of the last, unterminated line */
function eachLine(path: string, line: (buf: Buffer, start: number, end: number) => void): number {
  const fd = openSync(path, 'r');
  try {
    const size = fstatSync(fd).size;
    let buf = Buffer.allocUnsafe(1 << 22);
    let carry = 0; // bytes of an unfinished line at the start of buf
    for (let pos = 0; pos < size; ) {
      if (carry === buf.length) buf = Buffer.concat([buf, Buffer.allocUnsafe(buf.length)]);
      const n = readSync(fd, buf, carry, buf.length - carry, pos);
      pos += n;
      const filled = carry + n;
      const view = buf.subarray(0, filled);
      let from = 0;
      for (let nl = view.indexOf(10); nl >= 0; nl = view.indexOf(10, from)) {
        line(buf, from, nl);
        from = nl + 1;
      }
      buf.copy(buf, 0, from, filled);
      carry = filled - from;
    }
    return carry;
  } finally {
    closeSync(fd);
  }
}

/** Append one shard's JSON Lines to `out`, checking each line, and add them to the summary; @returns the number of lines */
function copyJsonl(s: ShardIn, out: Sink, summary: SweepSummary): number {
  const { start, end } = s.manifest.range;
  let count = 0;
  let last = start - 1;
  const torn = eachLine(join(s.dir, FILES.jsonl), (buf, a, b) => {
    let o: Record<string, unknown>;
    try {
      o = JSON.parse(buf.toString('utf8', a, b)) as Record<string, unknown>;
    } catch {
      throw refuse(s.dir, FILES.jsonl, 'shard-damaged', `line ${count + 1} is not valid JSON`);
    }
    const index = o.index;
    if (typeof index !== 'number' || index <= last || index >= end) {
      throw refuse(s.dir, FILES.jsonl, 'shard-damaged', `line ${count + 1} has index ${String(index)}, not one after ${last} within ${start}..${end - 1}`);
    }
    last = index;
    addToSummary(summary, summaryInputFromJson(o));
    out.write(buf, a, b + 1);
    count++;
  });
  if (torn) throw refuse(s.dir, FILES.jsonl, 'shard-damaged', 'ends in an unfinished line');
  return count;
}

/**
 * Append one shard's CSV rows to `out`, with its header when `header` is undefined (the first shard).
 * @returns the header and the number of rows
 */
function copyCsv(s: ShardIn, out: Sink, header: string | undefined): { header: string; rows: number } {
  let head: string | undefined;
  let rows = 0;
  let last = -1;
  const torn = eachLine(join(s.dir, FILES.csv), (buf, a, b) => {
    if (head === undefined) {
      head = buf.toString('utf8', a, b);
      if (header === undefined) out.write(buf, a, b + 1);
      else if (head !== header) throw refuse(s.dir, FILES.csv, 'shard-damaged', 'has other columns than the first shard');
      return;
    }
    const comma = buf.indexOf(44, a);
    const index = Number(buf.toString('latin1', a, comma < 0 || comma > b ? b : comma));
    if (!(index > last)) throw refuse(s.dir, FILES.csv, 'shard-damaged', `row ${rows + 1} is out of index order`);
    last = index;
    out.write(buf, a, b + 1);
    rows++;
  });
  if (torn || head === undefined) throw refuse(s.dir, FILES.csv, 'shard-damaged', torn ? 'ends in an unfinished line' : 'has no header');
  return { header: head, rows };
}

/** The outermost folder of `dir` that does not exist yet (to remove on failure), or undefined. */
function firstMissing(dir: string): string | undefined {
  let missing: string | undefined;
  for (let d = resolve(dir); !existsSync(d); d = dirname(d)) missing = d;
  return missing;
}

/**
 * Merge the run folders `dirs` (complete shards of one study) into `out`, which must not exist
 * or be empty. Missing shards make a 'partial' run (see `manifest.missing`).
 * @throws InputError naming the folder at fault; nothing is left behind
 */
export function mergeRuns(dirs: readonly string[], out: string, version: string): MergeResult {
  const shards = checkShards(dirs.map(readShard));
  if (existsSync(out) && (!statSync(out).isDirectory() || readdirSync(out).length > 0)) {
    throw refuse(out, '', 'out-not-empty', statSync(out).isDirectory() ? 'the --out folder is not empty; choose a new one' : 'is a file; --out must be a new folder');
  }
  const base = shards[0].manifest;
  const count = base.shard.count;
  const present = new Set(shards.map((s) => s.manifest.shard.index));
  const missing = Array.from({ length: count }, (_, i) => i + 1).filter((i) => !present.has(i)).map((i) => ({ shard: i, ...shardRange(base.spaceSize, i, count) }));

  const parent = dirname(resolve(out));
  const created = firstMissing(parent);
  mkdirSync(parent, { recursive: true });
  const tmp = join(parent, `.${basename(resolve(out))}.merge-${process.pid}-${randomBytes(4).toString('hex')}`);
  mkdirSync(tmp);
  const summary = emptySummary(base.objective);
  const mergedFrom: MergedShard[] = [];
  let jsonl: number | undefined;
  let csv: number | undefined;
  try {
    jsonl = openSync(join(tmp, FILES.jsonl), 'wx');
    csv = openSync(join(tmp, FILES.csv), 'wx');
    const sinks = [new Sink(jsonl), new Sink(csv)];
    let header: string | undefined;
    for (const s of shards) {
      const lines = copyJsonl(s, sinks[0], summary);
      const c = copyCsv(s, sinks[1], header);
      header = c.header;
      if (c.rows !== lines) throw refuse(s.dir, FILES.csv, 'shard-damaged', `has ${c.rows} rows, where variants.jsonl has ${lines} lines`);
      const { range, shard, runId } = s.manifest;
      summary.filtered += range.end - range.start - lines;
      mergedFrom.push({ dir: s.dir, runId, shard, range, variants: lines });
    }
    sinks.forEach((k) => { k.flush(); fsyncSync(k.fd); });
    const range = { start: shards[0].manifest.range.start, end: shards[shards.length - 1].manifest.range.end };
    const status = missing.length ? 'partial' : 'complete';
    const finished = shards.map((s) => s.manifest.finishedAt ?? '').sort();
    const manifest: MergedManifest = {
      ...base, panelpoint: version, runId: randomUUID(), shard: { index: 1, count: 1 }, range, status,
      startedAt: shards.map((s) => s.manifest.startedAt).sort()[0], finishedAt: finished[finished.length - 1], nextIndex: range.end,
      mergedAt: new Date().toISOString(), mergedFrom, ...(missing.length ? { missing } : {}),
    };
    // time summed over the shards (compute time, not wall time)
    const total = (k: 'seconds' | 'startupSeconds') => Number(shards.reduce((t, s) => t + s[k], 0).toFixed(3));
    const seconds = total('seconds');
    const doc = { panelpoint: version, runId: manifest.runId, study: manifest.study, shard: manifest.shard, range, status, units: manifest.units, seconds, startupSeconds: total('startupSeconds'), ...summary };
    writeSummary(tmp, doc);
    writeManifest(tmp, manifest as unknown as RunManifest);
    [jsonl, csv].forEach((fd) => closeSync(fd));
    jsonl = csv = undefined;
    renameSync(tmp, out); // replaces an empty folder in one step
    return { manifest, summary, seconds, doc };
  } catch (e) {
    for (const fd of [jsonl, csv]) if (fd !== undefined) closeSync(fd);
    rmSync(tmp, { recursive: true, force: true });
    if (created) rmSync(created, { recursive: true, force: true });
    throw e;
  }
}
