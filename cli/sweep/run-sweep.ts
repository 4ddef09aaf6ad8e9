// Drive a sweep over worker threads: batches out, results back, written in index order.
import { availableParallelism } from 'node:os';
import Piscina from 'piscina';
import { mergeSummary, type SweepSummary } from '../../shared/sweep/summary';
import type { SweepBatch, SweepTask } from '../worker/sweep-task';
import type { ResultWriter } from './run-dir';
import type { Progress } from './progress';

// The bundled worker when the CLI runs from its bundle (cli/bin/bundle.mjs), else the TypeScript one.
const workerFile = process.env.PANELPOINT_WORKER_URL ?? new URL('../worker/sweep-worker.mjs', import.meta.url).href;

export interface SweepDrive {
  task: Omit<SweepTask, 'start' | 'end'>;
  start: number;
  end: number;
  workers: number;
  batch: number;
  writer: ResultWriter;
  summary: SweepSummary;
  progress: Progress;
  /** Called after each write with the next index not yet on disk. */
  onFlush(nextIndex: number): void;
  /** True once the user asked to stop. */
  stopping(): boolean;
  /** Called once every worker has loaded the engine and the study, before the first batch. */
  onReady?(): void;
}

/** Default worker count: every core. */
export const defaultWorkers = (): number => availableParallelism();

/** Batch size: large enough to amortise messages, small enough to spread work and show progress. */
export function defaultBatch(count: number, workers: number): number {
  return Math.max(16, Math.min(2000, Math.ceil(count / (workers * 16))));
}

/** Run [start, end). @returns the next index not on disk (end unless stopped) */
export async function driveSweep(d: SweepDrive): Promise<number> {
  const pool = new Piscina<SweepTask, SweepBatch>({ filename: workerFile, minThreads: d.workers, maxThreads: d.workers, idleTimeout: 500, concurrentTasksPerWorker: 1,
    // Bounded heaps keep a million-variant sweep well under 500 MB resident: batches are short-lived.
    resourceLimits: { maxOldGenerationSizeMb: 96, maxYoungGenerationSizeMb: 16 } });
  const pending = new Map<number, SweepBatch>();
  const inflight = new Set<Promise<void>>();
  let next = d.start;
  let writeAt = d.start;
  let failure: unknown;
  const flush = () => {
    for (let b = pending.get(writeAt); b; b = pending.get(writeAt)) {
      pending.delete(writeAt);
      d.writer.append(b.jsonl, b.csv);
      mergeSummary(d.summary, b.summary);
      writeAt = b.end;
      d.progress.update(writeAt - d.start);
      d.onFlush(writeAt);
    }
  };
  const submit = () => {
    while (!failure && !d.stopping() && next < d.end && inflight.size < 2 * d.workers) {
      const start = next;
      const end = Math.min(d.end, start + d.batch);
      next = end;
      const p: Promise<void> = pool.run({ ...d.task, start, end }).then(
        (b) => { pending.set(start, b); flush(); },
        (e: unknown) => { failure ??= e; },
      ).finally(() => inflight.delete(p));
      inflight.add(p);
    }
  };
  try {
    // Warm every worker (load the engine, resolve the study) before timing the batches.
    await Promise.all(Array.from({ length: d.workers }, () => pool.run({ ...d.task, start: 0, end: 0 })));
    d.onReady?.();
    submit();
    while (inflight.size) {
      await Promise.race(inflight);
      submit();
    }
  } finally {
    await pool.destroy();
  }
  if (failure) throw failure;
  return writeAt;
}
