/**
 * The pushed figures of a variant against a fresh analysis of its model. The sweep stores forces
 * rounded to 1e-6 kN and displacements to 1e-9 m (shared/sweep/record-format.ts), hence the
 * tolerances: twice the rounding plus 1e-9 relative. A peak member may differ from the stored one
 * only when it carries the same force (a symmetric truss has two).
 */
import type { AnalysisJson } from '../../shared/report/analysis-json';
import type { VariantItem } from './variants-sql';
import type { VariantRecord } from '../../shared/sweep/evaluate';

export interface FigureDifference {
  field: string;
  stored: unknown;
  recomputed: unknown;
  message?: string;
}

export interface FigureCheck {
  matches: boolean;
  differences: FigureDifference[];
  /** What the check compared against, when the model shown is not that (a sized study). */
  note?: string;
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

/** What a recomputation found, from an analysis or from the sweep's own evaluation. */
interface Recomputed {
  status: string; k: number; s: number; joints: number; members: number; reactions: number;
  tension: Peak | null; compression: Peak | null; disp: number | null;
  /** The largest tension (+1) or compression (−1) a member carries over every combination; NaN when not known. */
  memberPeak(member: string, sign: 1 | -1): number;
}

function compare(v: VariantItem, now: Recomputed): FigureCheck {
  const d: FigureDifference[] = [];
  const same = (field: string, stored: unknown, recomputed: unknown) => {
    if (stored !== recomputed) d.push({ field, stored, recomputed });
  };
  same('status', v.status, now.status);
  same('k', v.k, now.k);
  same('s', v.s, now.s);
  same('joints', v.joints, now.joints);
  same('members', v.members, now.members);
  same('reactions', v.reactions, now.reactions);
  const force = (field: 'peakTension' | 'peakCompression', stored: number | null, member: string | null, peak: Peak | null) => {
    if (stored === null || peak === null) {
      if (stored !== (peak?.force ?? null)) d.push({ field, stored, recomputed: peak?.force ?? null });
      return;
    }
    if (!close(stored, peak.force, FORCE_TOL)) d.push({ field, stored, recomputed: peak.force });
    const memberForce = member === null ? NaN : now.memberPeak(member, field === 'peakTension' ? 1 : -1);
    if (member !== peak.member && !close(Math.abs(peak.force), memberForce, FORCE_TOL)) {
      d.push({ field: `${field}Member`, stored: member, recomputed: peak.member });
    }
  };
  force('peakTension', v.peakTension, v.peakTensionMember, now.tension);
  force('peakCompression', v.peakCompression, v.peakCompressionMember, now.compression);
  if (v.maxDisplacement === null || now.disp === null) {
    if (v.maxDisplacement !== now.disp) d.push({ field: 'maxDisplacement', stored: v.maxDisplacement, recomputed: now.disp });
  } else if (!close(v.maxDisplacement, now.disp, DISP_TOL)) {
    d.push({ field: 'maxDisplacement', stored: v.maxDisplacement, recomputed: now.disp });
  }
  return { matches: d.length === 0, differences: d };
}

/** The pushed figures against a fresh analysis of the variant's model (a study that does not size members). */
export function checkFigures(v: VariantItem, analysis: AnalysisJson): FigureCheck {
  const c = analysis.classification;
  const results = Object.values(analysis.results) as Result[];
  const stable = c.status !== 'unstable' && results.length > 0;
  const peaks = stable ? peaksOf(results) : { tension: null, compression: null, disp: null };
  return compare(v, {
    status: c.status, k: c.mechanisms, s: c.selfStress, joints: c.joints, members: c.members, reactions: c.reactions, ...peaks,
    memberPeak: (member, sign) => Math.max(...results.map((r) => sign * (r.memberForces[member] ?? NaN))),
  });
}

/**
 * The pushed figures against the sweep's own evaluation of the variant, for a study that sizes its
 * members: the figures depend on the sections the sizer chose and their self-weight, which the
 * one-section model does not have. `record` is undefined when the study's filters drop the variant.
 */
export function checkRecord(v: VariantItem, record: VariantRecord | undefined): FigureCheck {
  if (!record) return { matches: false, differences: [{ field: 'status', stored: v.status, recomputed: null, message: "the study's filters drop this variant" }] };
  const stable = record.status === 'determinate' || record.status === 'indeterminate';
  const peak = (member: string, force: number): Peak | null => (stable && member ? { member, force } : null);
  return compare(v, {
    status: record.status, k: record.k, s: record.s, joints: record.joints, members: record.members, reactions: record.reactions,
    tension: peak(record.peakTensionMember, record.peakTension), compression: peak(record.peakCompressionMember, record.peakCompression),
    disp: stable ? record.maxDisplacement : null,
    memberPeak: () => NaN, // the same engine picks the same member: any other is a difference
  });
}
