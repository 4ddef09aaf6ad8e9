/**
 * The pushed figures of a variant against a fresh analysis of its model. The sweep stores forces
 * rounded to 1e-6 kN and displacements to 1e-9 m (shared/sweep/record-format.ts), hence the
 * tolerances: twice the rounding plus 1e-9 relative. A peak member may differ from the stored one
 * only when it carries the same force (a symmetric truss has two).
 */
import type { AnalysisJson } from '../../shared/report/analysis-json';
import type { VariantItem } from './variants-sql';

export interface FigureDifference {
  field: string;
  stored: unknown;
  recomputed: unknown;
  message?: string;
}

export interface FigureCheck {
  matches: boolean;
  differences: FigureDifference[];
}

const FORCE_TOL = 2e-6; // kN
const DISP_TOL = 2e-9; // m
const close = (a: number, b: number, abs: number) => Math.abs(a - b) <= abs + 1e-9 * Math.max(Math.abs(a), Math.abs(b));

interface Peak { member: string; force: number }
type Result = { memberForces: Record<string, number>; peak: { tension: Peak | null; compression: Peak | null; maxDisplacement: { node: string; value: number } } };

/** Peaks over every combination (the sweep's figures): the first largest wins, as in the sweep. */
function peaksOf(results: Result[]) {
  let tension: Peak | null = null;
  let compression: Peak | null = null;
  let disp: number | null = null;
  for (const r of results) {
    const p = r.peak;
    if (p.tension && (!tension || p.tension.force > tension.force)) tension = p.tension;
    if (p.compression && (!compression || p.compression.force < compression.force)) compression = p.compression;
    if (disp === null || p.maxDisplacement.value > disp) disp = p.maxDisplacement.value;
  }
  return { tension, compression, disp };
}

export function checkFigures(v: VariantItem, analysis: AnalysisJson): FigureCheck {
  const d: FigureDifference[] = [];
  const c = analysis.classification;
  const same = (field: string, stored: unknown, recomputed: unknown) => {
    if (stored !== recomputed) d.push({ field, stored, recomputed });
  };
  same('status', v.status, c.status);
  same('k', v.k, c.mechanisms);
  same('s', v.s, c.selfStress);
  same('joints', v.joints, c.joints);
  same('members', v.members, c.members);
  same('reactions', v.reactions, c.reactions);
  const results = Object.values(analysis.results) as Result[];
  const stable = c.status !== 'unstable' && results.length > 0;
  const peaks = stable ? peaksOf(results) : { tension: null, compression: null, disp: null };
  const force = (field: 'peakTension' | 'peakCompression', stored: number | null, member: string | null, now: Peak | null) => {
    if (stored === null || now === null) {
      if (stored !== (now?.force ?? null)) d.push({ field, stored, recomputed: now?.force ?? null });
      return;
    }
    if (!close(stored, now.force, FORCE_TOL)) d.push({ field, stored, recomputed: now.force });
    const memberForce = member === null ? NaN : Math.max(...results.map((r) => (field === 'peakTension' ? 1 : -1) * (r.memberForces[member] ?? NaN)));
    if (member !== now.member && !close(Math.abs(now.force), memberForce, FORCE_TOL)) {
      d.push({ field: `${field}Member`, stored: member, recomputed: now.member });
    }
  };
  force('peakTension', v.peakTension, v.peakTensionMember, peaks.tension);
  force('peakCompression', v.peakCompression, v.peakCompressionMember, peaks.compression);
  if (v.maxDisplacement === null || peaks.disp === null) {
    if (v.maxDisplacement !== peaks.disp) d.push({ field: 'maxDisplacement', stored: v.maxDisplacement, recomputed: peaks.disp });
  } else if (!close(v.maxDisplacement, peaks.disp, DISP_TOL)) {
    d.push({ field: 'maxDisplacement', stored: v.maxDisplacement, recomputed: peaks.disp });
  }
  return { matches: d.length === 0, differences: d };
}
