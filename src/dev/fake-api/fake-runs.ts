/**
 * Runs of the fake demo: studies swept in the browser on first use, their summaries, variants
 * (with the real model and analysis of each), marks and comments kept in memory.
 */
import type { StudyLoad } from '@shared/schemas/study-loads';
import { buildModel } from '@shared/families/to-model';
import { analyzeModel } from '@/lib/browser-analysis';
import type { MarkKind, RunDetail, StudyDetail, VariantComment, VariantDetailDto, VariantMark, VariantRow } from '@/lib/run-types';
import { ApiError } from '@/lib/api-client';
import { rowAt, rowOf, statusOf, sweepStudy, type RunStore } from './run-store';
import { DEPOT_SIZED, DEPOT_WIDE, FOOTBRIDGE } from './demo-studies';
import { demoSummary } from './demo-summary';

interface FakeRun {
  project: string;
  runId: string;
  study: StudyDetail;
  body: unknown;
  limit?: number;
  status: string;
  pushedBy: { id: number; name: string };
  pushedAt: string;
  cliVersion: string;
  gitCommit: string;
  shards: number;
  store?: RunStore;
}

const ELLIS = { id: 2, name: 'Ellis Engineer' };
const at = (d: string) => new Date(d).toISOString();
const study = (id: number, body: { name: string; family: string }, hash: string, createdAt: string): StudyDetail =>
  ({ id, name: body.name, family: body.family, hash, createdAt: at(createdAt), runCount: 0, body });

const S1 = study(1, DEPOT_SIZED, 'e41f0c7a9b2d58c3a6f1e0d9b8c7a6f5e4d3c2b1a09f8e7d6c5b4a3928171605', '2025-02-10T08:00:00Z');
const S2 = study(2, DEPOT_WIDE, '9a8b7c6d5e4f30211203f4e5d6c7b8a9f0e1d2c3b4a5968778695a4b3c2d1e0f', '2025-02-18T13:00:00Z');
const S3 = study(3, FOOTBRIDGE, '5b6c7d8e9f0a1b2c3d4e5f60718293a4b5c6d7e8f9001122334455667788990a', '2025-02-21T10:30:00Z');

export const RUNS: FakeRun[] = [
  { project: 'harrow-lane-depot', runId: 'b7e3c1d2-4f5a-4e6b-9c8d-1a2b3c4d5e6f', study: S1, body: DEPOT_SIZED, status: 'complete', pushedBy: ELLIS,
    pushedAt: at('2025-02-14T16:42:00Z'), cliVersion: '0.1.0', gitCommit: 'd2a85f16c0b1e4f7a9d3c5e8b2f6a1d4c7e9b0a3', shards: 1 },
  { project: 'harrow-lane-depot', runId: '0c4a9e21-7d3b-4c58-a1f6-2e9b8d7c6a50', study: S1, body: DEPOT_SIZED, limit: 2400, status: 'interrupted', pushedBy: ELLIS,
    pushedAt: at('2025-02-11T09:05:00Z'), cliVersion: '0.1.0-rc.2', gitCommit: '91b3c7e40d2f6a8b1c3e5d7f9a0b2c4d6e8f1a3b', shards: 1 },
  { project: 'harrow-lane-depot', runId: `${S2.hash.slice(0, 32)}/4`, study: S2, body: DEPOT_WIDE, status: 'complete', pushedBy: { id: 6, name: 'CI (token ci-main)' },
    pushedAt: at('2025-02-19T02:10:00Z'), cliVersion: '0.1.0', gitCommit: 'd2a85f16c0b1e4f7a9d3c5e8b2f6a1d4c7e9b0a3', shards: 4 },
  { project: 'kestrel-brook-footbridge', runId: 'f1e2d3c4-b5a6-4978-8a9b-0c1d2e3f4a5b', study: S3, body: FOOTBRIDGE, status: 'complete', pushedBy: { id: 1, name: 'Ada Admin' },
    pushedAt: at('2025-02-21T11:00:00Z'), cliVersion: '0.1.0', gitCommit: '5c7e0b42a1d3f5b7c9e0a2d4f6b8c1e3a5d7f9b0', shards: 1 },
];
for (const r of RUNS) r.study.runCount++;

export const STUDIES = [S1, S2, S3];
export const studyProject = (id: number) => RUNS.find((r) => r.study.id === id)!.project;

export function storeOf(r: FakeRun): RunStore {
  r.store ??= sweepStudy(r.body, r.limit);
  return r.store;
}

export function findRun(project: string, runId: string): FakeRun {
  const r = RUNS.find((x) => x.project === project && x.runId === runId);
  if (!r) throw new ApiError(404, 'run-not-found', 'No such run in this project.');
  return r;
}

export function runSummary(r: FakeRun): Omit<RunDetail, 'summary' | 'paramNames' | 'paramColumns' | 'combinations'> {
  const s = storeOf(r);
  const byStatus = demoSummary(s, r.body).byStatus;
  return {
    runId: r.runId, study: { id: r.study.id, name: r.study.name, family: r.study.family }, pushedBy: r.pushedBy, pushedAt: r.pushedAt,
    cliVersion: r.cliVersion, gitCommit: r.gitCommit, status: r.status, variantCount: s.n, byStatus,
    shards: Array.from({ length: r.shards }, (_, i) => ({ index: i + 1, count: r.shards })),
  };
}

export function runDetail(r: FakeRun): RunDetail {
  const s = storeOf(r);
  return {
    ...runSummary(r), summary: demoSummary(s, r.body), paramNames: s.paramNames,
    paramColumns: Object.fromEntries(s.numericParams.map((p, i) => [p, `p${i + 1}`])),
    combinations: s.resolved.combinations.map((c) => ({ id: c.id, factors: c.factors, source: c.source ?? '' })),
    spaceSize: s.spaceSize,
  };
}

const marks = new Map<string, Map<number, MarkKind>>();
const comments = new Map<string, VariantComment[]>();
const key = (r: FakeRun, index: number) => `${r.runId}#${index}`;

export function marksOf(r: FakeRun, index: number): VariantMark[] {
  const names: Record<number, string> = { 1: 'Ada Admin', 2: 'Ellis Engineer', 3: 'Rowan Reviewer', 4: 'Vic Viewer' };
  return [...(marks.get(key(r, index)) ?? new Map<number, MarkKind>())].map(([id, kind]) => ({ kind, user: { id, name: names[id] ?? `user ${id}` } }));
}

export function setMark(r: FakeRun, index: number, userId: number, kind: MarkKind | null): void {
  const m = marks.get(key(r, index)) ?? new Map<number, MarkKind>();
  if (kind) m.set(userId, kind);
  else m.delete(userId);
  marks.set(key(r, index), m);
}

export function commentsOf(r: FakeRun, index: number): VariantComment[] {
  return comments.get(key(r, index)) ?? [];
}

export function addComment(r: FakeRun, index: number, author: { id: number; name: string }, body: string): VariantComment {
  const c: VariantComment = { id: Date.now(), body, createdAt: new Date().toISOString(), author };
  comments.set(key(r, index), [...commentsOf(r, index), c]);
  return c;
}

export function rowWithMarks(r: FakeRun, j: number): VariantRow {
  const s = storeOf(r);
  return { ...rowOf(s, j), marks: marksOf(r, s.index[j]) };
}

/** One variant with its model rebuilt from the study and analysed here, like the server does. */
export function variantDetail(r: FakeRun, index: number): VariantDetailDto {
  const s = storeOf(r);
  const j = rowAt(s, index);
  if (j < 0) throw new ApiError(404, 'variant-not-found', `Run ${r.runId} has no variant ${index}.`);
  const variant = rowWithMarks(r, j);
  const setup = s.resolved.setup!;
  if (statusOf(s, j) === 'error') return { variant, model: null, analysis: null, check: { matches: true, differences: [] } };
  const model = buildModel(setup.family, variant.params, {
    loads: setup.caseLoads.flat() as StudyLoad[], combinations: s.resolved.combinations, name: `${r.study.name}: variant ${index}`,
  });
  const a = analyzeModel(model);
  if (!a.ok) throw new ApiError(500, 'rebuild-failed', a.issues.map((i) => i.message).join('; '));
  // One demo variant shows what a failed check looks like.
  const check = index === s.index[Math.min(7, s.n - 1)] && variant.weight !== null
    ? { matches: false, differences: [{ field: 'weight', stored: variant.weight, recomputed: Number((variant.weight * 1.004).toPrecision(6)), message: 'the CHS catalogue changed since the run' }] }
    : { matches: true, differences: [] };
  return { variant, model, analysis: a.json, check };
}
