/**
 * What the web app reads about studies, runs and variants (notes/runs-api.md, and the shapes
 * server/services/runs*, variants* answer). Forces and weight kN (compression negative),
 * displacement m, as the CLI records them; timestamps ISO 8601.
 */
import type { Model } from '@shared/schemas/model';
import type { AnalysisJson } from '@shared/report/analysis-json';
import type { SweepSummary } from '@shared/sweep/summary';
import type { Timestamp } from './api-types';

export type VariantStatus = 'determinate' | 'indeterminate' | 'unstable' | 'error';
export type MarkKind = 'candidate' | 'rejected';

export interface StudySummary {
  id: number;
  name: string;
  family: string;
  hash: string;
  createdAt: Timestamp;
  runCount: number;
}

export interface StudyDetail extends StudySummary {
  /** The study file as pushed. */
  body: unknown;
}

export interface RunSummary {
  runId: string;
  study: { id: number; name: string; family: string };
  pushedBy: { id: number; name: string } | null;
  pushedAt: Timestamp;
  cliVersion: string;
  gitCommit: string | null;
  /** receiving, complete, interrupted… */
  status: string;
  variantCount: number;
  byStatus: Partial<Record<VariantStatus, number>> | null;
  shards: unknown;
}

export interface RunDetail extends RunSummary {
  summary: SweepSummary | null;
  paramNames: string[];
  /** Numeric parameters the server can bin on: name → generic column (p1..p6). */
  paramColumns: Record<string, string>;
  combinations: { id: string; factors?: Record<string, number>; source?: string }[];
  /** Variants in the study's space (before `where` filters), when known. */
  spaceSize?: number | null;
}

/** A team member's mark: the server names the user (`user`); the first contract said `userId`. */
export interface VariantMark {
  kind: MarkKind;
  user?: { id: number; name: string } | null;
  userId?: number;
  updatedAt?: Timestamp;
}

/** One row of GET …/variants: forces kN (compression negative), displacement m, weight kN. */
export interface VariantRow {
  pk: number;
  index: number;
  variantId: string;
  params: Record<string, number | string>;
  status: VariantStatus;
  joints: number;
  members: number;
  reactions: number;
  k: number;
  s: number;
  critical: boolean;
  peakTension: number | null;
  peakTensionMember: string | null;
  peakCompression: number | null;
  peakCompressionMember: string | null;
  maxDisplacement: number | null;
  spanOverDeflection: number | null;
  weight: number | null;
  maxUtilisation: number | null;
  reason: string | null;
  marks: VariantMark[];
}

export interface Page<T> {
  total: number;
  page: number;
  pageSize: number;
  items: T[];
}

/** GET …/points: columns of equal length, for WebGL scatter charts. */
export interface Points {
  count: number;
  truncated: boolean;
  x: (number | string | null)[];
  y: (number | string | null)[];
  color?: (number | string | null)[];
  index: number[];
  status: VariantStatus[];
}

/** GET …/aggregate: counts, and min / max of y (of z when given) and mean of z, per bin: `count[ix][iy]`. */
export interface Aggregate {
  xEdges: number[];
  yEdges: number[];
  count: number[][];
  min: (number | null)[][];
  max: (number | null)[][];
  mean?: (number | null)[][];
}

/** One figure where the server's recomputation and the pushed run disagree. */
export interface FigureDifference {
  field: string;
  stored: unknown;
  recomputed: unknown;
  message?: string;
}

/** The server's check that recomputing the variant gives the pushed figures. */
export interface RecomputeCheck {
  matches: boolean;
  differences: FigureDifference[];
  /** What the check compared against, when the page's drawing is not that (a sized study). */
  note?: string;
}

export interface VariantDetailDto {
  variant: VariantRow;
  /** Null when the variant cannot be built (a failed variant). */
  model: Model | null;
  analysis: AnalysisJson | null;
  check: RecomputeCheck;
}

export interface VariantComment {
  id: number;
  body: string;
  createdAt: Timestamp;
  author: { id: number; name: string } | null;
}

/** pass; drift: figures out of tolerance; invalid: the case does not load; error: recomputation failed. */
