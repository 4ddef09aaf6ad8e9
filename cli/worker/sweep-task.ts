// One batch of a sweep in a worker thread: evaluate variants [start, end) and return their
// JSON Lines and CSV rows as UTF-8 bytes (written straight into reused buffers) with the batch's summary. The resolved study is cached per study hash.
import { workerData } from 'node:worker_threads';
import { resolveStudy } from '../../shared/sweep/resolve-study';
import { slotViews, type SweepSlots } from './slots';
import { VariantEvaluator } from '../../shared/sweep/evaluate';
import { storedFigures } from '../../shared/sweep/record-format';
import { RecordEncoder } from '../../shared/sweep/record-bytes';
import { addToSummary, emptySummary, type Objective, type SummaryInput, type SweepSummary } from '../../shared/sweep/summary';

/** What the main thread sends. */
export interface SweepTask {
  study: unknown;
  studyHash: string;
  objective: Objective;
  start: number;
  end: number;
  /**
   * Where to write the batch's bytes: a slot of the memory shared with the main thread (given once
   * to each worker as `workerData.sweepSlots`), which writes them to disk and hands the slot to a
   * later batch. The batch then returns only lengths, so its bytes cross no thread by copy. A batch
   * that outgrows its slot returns copies instead.
   */
  slot?: number;
}

// Sent once per worker: a SharedArrayBuffer sent with every task would arrive as a new buffer
// object each time, each reporting the whole memory to the garbage collector as external.
const shared = (workerData as { sweepSlots?: SweepSlots } | null)?.sweepSlots;
const views: { jsonl: Uint8Array; csv: Uint8Array }[] = [];

/** What a batch returns. */
export interface SweepBatch {
  start: number;
  end: number;
  /** The batch's JSON Lines: their length in the task's slot, or the bytes themselves. */
  jsonl: number | Uint8Array;
  /** The batch's CSV rows, the same way. */
  csv: number | Uint8Array;
  summary: SweepSummary;
}

let cached: { hash: string; evaluator: VariantEvaluator; encoder: RecordEncoder } | undefined;

/** Evaluate one batch; used by piscina and directly by tests. */
export function evaluateBatch(task: SweepTask): SweepBatch {
  if (!cached || cached.hash !== task.studyHash) {
    const r = resolveStudy(task.study, { validated: true }); // the main thread checked these bytes
    if (!r.setup) throw new Error(`study does not resolve in the worker: ${r.issues.map((i) => `${i.path}: ${i.message}`).join('; ')}`);
    const evaluator = new VariantEvaluator(r.setup);
    cached = { hash: task.studyHash, evaluator, encoder: new RecordEncoder(r.setup.plan.paramNames, r.setup.design !== undefined, evaluator.slots, r.setup.plan) };
  }
  const { evaluator: ev, encoder } = cached;
  const names = ev.setup.plan.paramNames;
  const summary = emptySummary(task.objective);
  const figures = {} as SummaryInput;
  const into = shared && task.slot !== undefined ? (views[task.slot] ??= slotViews(shared, task.slot)) : undefined;
  encoder.jsonl.writeInto(into?.jsonl);
  encoder.csv.writeInto(into?.csv);
  for (let i = task.start; i < task.end; i++) {
    const rec = ev.evaluate(i);
    if (!rec) {
      summary.filtered++;
      continue;
    }
    encoder.write(rec);
    addToSummary(summary, storedFigures(rec, names, figures), names);
  }
  const jsonl = encoder.jsonl.finish(), csv = encoder.csv.finish();
  // a view of the slot goes back as its length; bytes that outgrew it as themselves
  const inSlot = (b: Uint8Array) => b.buffer === shared?.memory;
  return { start: task.start, end: task.end, jsonl: inSlot(jsonl) ? jsonl.length : jsonl, csv: inSlot(csv) ? csv.length : csv, summary };
}

/** Piscina entry (bytes in a shared slot cross as lengths; copies otherwise, by structured clone). */
export default function runBatch(task: SweepTask): SweepBatch {
  return evaluateBatch(task);
}
