/**
 * What the web app expects from the team server under /api. A proposal until the server
 * exists: names follow the house style (runs, variants, reference cases); align with
 * server/routes when they land.
 */
import type { Model } from '@shared/schemas/model';
import type { AnalysisJson } from '@shared/report/analysis-json';

export interface Me {
  id: string;
  email: string;
  name: string;
  role: string;
}

export interface ProjectSummary {
  id: string;
  name: string;
  updatedAt: string;
}

export interface StudySummary {
  id: string;
  projectId: string;
  name: string;
  family: string;
  runs: number;
}

export interface RunSummary {
  id: string;
  studyId: string;
  createdAt: string;
  variants: number;
  failed: number;
}

export interface Page<T> {
  items: T[];
  total: number;
  page: number;
  pageSize: number;
}

/** One row of a run's variants table. */
export interface VariantRow {
  id: string;
  params: Record<string, number | string>;
  status: 'ok' | 'unstable' | 'failed';
  /** Largest tension and compression (negative), in the run's force unit. */
  peakTension?: number;
  peakCompression?: number;
}

/** One variant of a run: its parameters, the model it produced and the analysis JSON of that model. */
export interface VariantDetailDto {
  id: string;
  runId: string;
  params: Record<string, number | string>;
  model: Model;
  analysis: AnalysisJson;
}
