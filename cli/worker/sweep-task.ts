// One batch of a sweep in a worker thread: evaluate variants [start, end) and return their
// JSON Lines and CSV rows as UTF-8 bytes with the batch's summary. The resolved study is cached per study hash.
import { resolveStudy } from '../../shared/sweep/resolve-study';
import { VariantEvaluator } from '../../shared/sweep/evaluate';
import { formatRecord, storedFigures, type FormattedRecord } from '../../shared/sweep/record-format';
import { addToSummary, emptySummary, type Objective, type SweepSummary } from '../../shared/sweep/summary';

/** What the main thread sends. */
export interface SweepTask {
  study: unknown;
  studyHash: string;
  objective: Objective;
  start: number;
  end: number;
}

/** What a batch returns. */
export interface SweepBatch {
  start: number;
  end: number;
  jsonl: Uint8Array;
  csv: Uint8Array;
  summary: SweepSummary;
}

let cached: { hash: string; evaluator: VariantEvaluator } | undefined;

/** A growable UTF-8 byte buffer: lines are encoded as they come, so no long string builds up. */
class ByteSink {
  buf: Buffer;
  len = 0;
  constructor(size: number) {
    this.buf = Buffer.allocUnsafeSlow(size);
  }
  write(s: string): void {
    if (this.len + s.length * 3 > this.buf.length) {
      const next = Buffer.allocUnsafeSlow(Math.max(this.buf.length * 2, this.len + s.length * 3));
      this.buf.copy(next, 0, 0, this.len);
      this.buf = next;
    }
    this.len += this.buf.write(s, this.len, "utf8");
  }
  bytes(): Uint8Array {
    return new Uint8Array(this.buf.buffer, this.buf.byteOffset, this.len);
  }
}

/** Evaluate one batch; used by piscina and directly by tests. */
export function evaluateBatch(task: SweepTask): SweepBatch {
  if (!cached || cached.hash !== task.studyHash) {
    const r = resolveStudy(task.study);
    if (!r.setup) throw new Error(`study does not resolve in the worker: ${r.issues.map((i) => `${i.path}: ${i.message}`).join('; ')}`);
    cached = { hash: task.studyHash, evaluator: new VariantEvaluator(r.setup) };
  }
  const ev = cached.evaluator;
  const names = ev.setup.plan.paramNames;
  const design = ev.setup.design !== undefined;
  const summary = emptySummary(task.objective);
  const n = task.end - task.start;
  const jsonl = new ByteSink(Math.max(4096, n * 800));
  const csv = new ByteSink(Math.max(4096, n * 400));
  const lines: FormattedRecord = { json: '', csv: '' };
  for (let i = task.start; i < task.end; i++) {
    const rec = ev.evaluate(i);
    if (!rec) {
      summary.filtered++;
      continue;
    }
    formatRecord(rec, names, lines, design);
    jsonl.write(lines.json);
    csv.write(lines.csv);
    addToSummary(summary, storedFigures(rec, names), names);
  }
  return { start: task.start, end: task.end, jsonl: jsonl.bytes(), csv: csv.bytes(), summary };
}

/** Piscina entry (the bytes are copied once by structured clone: about a millisecond a batch). */
export default function runBatch(task: SweepTask): SweepBatch {
  return evaluateBatch(task);
}
