// Shared by the web tests: the shipped example models analysed by the engine, as the pages do.
import type { Model } from '@shared/schemas/model';
import type { AnalysisJson } from '@shared/report/analysis-json';
import { analyzeModel } from '@/lib/browser-analysis';
import depotRoof from '../../examples/models/depot-roof-r3.json';
import missingDiagonal from '../../examples/models/depot-roof-r3-missing-diagonal.json';

export const DEPOT = depotRoof as unknown as Model;
export const MISSING = missingDiagonal as unknown as Model;

export function analysed(model: Model): AnalysisJson {
  const r = analyzeModel(model);
  if (!r.ok) throw new Error(`example does not analyse: ${r.issues.map((i) => i.message).join('; ')}`);
  return r.json;
}

/** Forces of one loading, by member id. */
export function forcesOf(a: AnalysisJson, loading: string): Record<string, number> {
  return (a.results[loading] as { memberForces: Record<string, number> }).memberForces;
}

/** Pretend the user asked for reduced motion, so no animation frame runs unless a test starts it. */
export function preferReducedMotion(): void {
  window.matchMedia = ((query: string) => ({
    matches: query.includes('reduce'), media: query, onchange: null,
    addEventListener: () => {}, removeEventListener: () => {}, addListener: () => {}, removeListener: () => {}, dispatchEvent: () => false,
  })) as unknown as typeof window.matchMedia;
}
