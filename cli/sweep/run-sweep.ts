// Drive a sweep over worker threads: batches out, results back, written in index order.
import { availableParallelism } from 'node:os';
import Piscina from 'piscina';
import { mergeSummary, type SweepSummary } from '../../shared/sweep/summary';
import type { SweepBatch, SweepTask } from '../worker/sweep-task';
import { slotViews, type SweepSlots } from '../worker/slots';
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

/** Shared-memory slots that batches write their bytes into (see `SweepTask.slot`). */
class SlotPool {
  private readonly free: number[] = [];
  private readonly views: { jsonl: Uint8Array; csv: Uint8Array }[] = [];
  readonly shared: SweepSlots;
  constructor(count: number, batch: number) {
    // Bytes a variant takes, with room to spare (the benchmark study's lines are about 500 and 250;
    // sized studies' add about 200 each). A batch that outgrows its slot falls back to copies, and
    // slots stay below 8 + 5 MB, so a large --batch cannot make them take gigabytes.
    const jsonlBytes = Math.min(batch * 1024 + 65536, 8 << 20);
    const csvBytes = Math.min(batch * 640 + 65536, 5 << 20);
    this.shared = { memory: new SharedArrayBuffer(count * (jsonlBytes + csvBytes)), jsonlBytes, csvBytes };
    for (let i = 0; i < count; i++) {
      this.views.push(slotViews(this.shared, i));
      this.free.push(i);
    }
  }
  get available(): boolean { return this.free.length > 0; }
  take(): number { return this.free.pop()!; }
  /** The batch's bytes: in slot `i` (lengths) or copies. */
  bytes(i: number, b: SweepBatch): { jsonl: Uint8Array; csv: Uint8Array } {
    const v = this.views[i];
    return {
      jsonl: typeof b.jsonl === 'number' ? v.jsonl.subarray(0, b.jsonl) : b.jsonl,
      csv: typeof b.csv === 'number' ? v.csv.subarray(0, b.csv) : b.csv,
    };
  }
  give(i: number): void { this.free.push(i); }
}

/** Run [start, end). @returns the next index not on disk (end unless stopped) */
export async function driveSweep(d: SweepDrive): Promise<number> {
  // Two batches per worker under way, and room for as many finished ones waiting their turn to be written.
  const maxInflight = 2 * d.workers;
  const slots = new SlotPool(2 * maxInflight, d.batch);
  const pool = new Piscina<SweepTask, SweepBatch>({ filename: workerFile, minThreads: d.workers, maxThreads: d.workers, idleTimeout: 500, concurrentTasksPerWorker: 1,
    workerData: { sweepSlots: slots.shared },
    // Bounded heaps keep a million-variant sweep well under 500 MB resident: batches are short-lived.
    // The young generation is the larger share on purpose: a variant leaves ≈ 300 bytes of garbage,
    // and with 16 MB a million variants took 137 scavenges and ≈ 0.7 s of CPU, with 64 MB 69 and
    // ≈ 0.23 s (2 workers, bench study; ≈ 90 MB more resident for the two).
    resourceLimits: { maxOldGenerationSizeMb: 96, maxYoungGenerationSizeMb: 64 } });
  const pending = new Map<number, { b: SweepBatch; slot: number }>();
  const inflight = new Set<Promise<void>>();
  let next = d.start;
  let writeAt = d.start;
  let failure: unknown;
  const flush = () => {
    for (let p = pending.get(writeAt); p; p = pending.get(writeAt)) {
      const { b, slot } = p;
      pending.delete(writeAt);
      const { jsonl, csv } = slots.bytes(slot, b);
      d.writer.append(jsonl, csv);
      slots.give(slot); // written: its bytes may now be overwritten
      mergeSummary(d.summary, b.summary);
      writeAt = b.end;
      d.progress.update(writeAt - d.start);
      d.onFlush(writeAt);
    }
  };
  const submit = () => {
    while (!failure && !d.stopping() && next < d.end && inflight.size < maxInflight && slots.available) {
      const start = next;
      const end = Math.min(d.end, start + d.batch);
      next = end;
      const slot = slots.take();
      const p: Promise<void> = pool.run({ ...d.task, start, end, slot }).then(
        (b) => { pending.set(start, { b, slot }); flush(); },
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
