// One batch of a sweep in a worker thread: evaluate variants [start, end) and return their
// JSON Lines, CSV rows and summary. The resolved study is cached per study hash.
import { resolveStudy } from '../../shared/sweep/resolve-study';
import { VariantEvaluator } from '../../shared/sweep/evaluate';
import { csvRow, jsonLine, storedFigures } from '../../shared/sweep/record-format';
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
  jsonl: string;
  csv: string;
  summary: SweepSummary;
}

let cached: { hash: string; evaluator: VariantEvaluator } | undefined;

export default function runBatch(task: SweepTask): SweepBatch {
  if (!cached || cached.hash !== task.studyHash) {
    const r = resolveStudy(task.study);
    if (!r.setup) throw new Error(`study does not resolve in the worker: ${r.issues.map((i) => `${i.path}: ${i.message}`).join('; ')}`);
    cached = { hash: task.studyHash, evaluator: new VariantEvaluator(r.setup) };
  }
  const ev = cached.evaluator;
  const names = ev.setup.plan.paramNames;
  const summary = emptySummary(task.objective);
  let jsonl = '';
  let csv = '';
  for (let i = task.start; i < task.end; i++) {
    const rec = ev.evaluate(i);
    if (!rec) {
      summary.filtered++;
      continue;
    }
    jsonl += jsonLine(rec, names);
    csv += csvRow(rec, names);
    addToSummary(summary, storedFigures(rec));
  }
  return { start: task.start, end: task.end, jsonl, csv, summary };
}
