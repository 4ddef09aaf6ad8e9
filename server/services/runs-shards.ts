/**
 * The shards of a server run. A sharded sweep (`panelpoint sweep --shard i/n`) is pushed shard by
 * shard into one run; each shard keeps its own summary so that the run's summary is always the
 * merge of what it holds (shared/sweep/summary.ts mergeSummary), whatever the order of pushes.
 */
import { emptySummary, mergeSummary, type Objective, type SweepSummary } from '../../shared/sweep/summary';
import type { PushManifest, PushSummary } from '../schemas/runs';

/** One shard as stored in Run.shards. */
export interface ShardEntry {
  index: number;
  count: number;
  range: { start: number; end: number };
  /** The CLI's uuid of the shard's run folder. */
  runId: string;
  /** The sweep's status when pushed: complete, interrupted or partial (a merged folder with gaps). */
  status: string;
  /** Variants stored from this shard. */
  variants: number;
  /** Index of its last stored variant (−1 when none): a resumed shard pushes only what follows. */
  lastIndex: number;
  pushedAt: string;
  summary: SweepSummary;
  /** From the shard's run.json: the same for every shard of a run. */
  spaceSize: number;
  paramNames: string[];
  combinations: PushManifest['combinations'];
}

/** A shard as the API shows it (without its summary and the run facts). */
export type PublicShard = Omit<ShardEntry, 'summary' | 'paramNames' | 'combinations' | 'spaceSize'>;

/** The summary figures of summary.json, without its run facts (seconds, workers...). */
export function coreSummary(s: PushSummary): SweepSummary {
  const { objective, evaluated, filtered, byStatus, critical, best, reasons } = s;
  return { objective: objective as Objective, evaluated, filtered, byStatus, critical, best, reasons } as SweepSummary;
}

export function shardsOf(raw: unknown): ShardEntry[] {
  return Array.isArray(raw) ? (raw as ShardEntry[]) : [];
}

export function publicShards(raw: unknown): PublicShard[] {
  return shardsOf(raw).map(({ summary: _s, paramNames: _p, combinations: _c, spaceSize: _n, ...rest }) => rest);
}

/** Replace (or add) the entry of one shard; entries stay in shard order. */
export function withShard(shards: readonly ShardEntry[], entry: ShardEntry): ShardEntry[] {
  return [...shards.filter((s) => s.index !== entry.index), entry].sort((a, b) => a.index - b.index);
}

/** The entry for a shard just pushed. */
export function shardEntry(m: PushManifest, summary: PushSummary, variants: number, lastIndex: number): ShardEntry {
  return {
    index: m.shard.index, count: m.shard.count, range: { ...m.range }, runId: m.runId, status: m.status,
    variants, lastIndex, pushedAt: new Date().toISOString(), summary: coreSummary(summary),
    spaceSize: m.spaceSize, paramNames: [...m.paramNames], combinations: m.combinations,
  };
}

/** The run's summary: every shard's summary merged, in shard order. */
export function mergedSummary(shards: readonly ShardEntry[]): SweepSummary | null {
  if (!shards.length) return null;
  const out = emptySummary(shards[0].summary.objective);
  for (const s of shards) mergeSummary(out, structuredClone(s.summary));
  return out;
}

/**
 * complete: every shard of the count is in and complete; partial: shards are missing (or a
 * merged folder had gaps); interrupted: a shard stopped before its end (resume it and push again).
 */
export function runStatus(shards: readonly ShardEntry[]): 'complete' | 'partial' | 'interrupted' {
  const count = shards[0]?.count ?? 1;
  if (shards.some((s) => s.status === 'interrupted' || s.status === 'running')) return 'interrupted';
  if (shards.length < count || shards.some((s) => s.status === 'partial')) return 'partial';
  return 'complete';
}
