/**
 * The JSON contract of `panelpoint analyze --json`: CI jobs and reference cases read these keys.
 * Values are in the model's own units (`units`); member forces are tension positive.
 */
import type { Structure } from '../engine/structure';
import type { Analysis } from '../engine/analyze';
import type { SectionResult } from '../engine/sections';
import { CAUTIONS } from '../cautions';

/** Unit factors: metres and kN per one model unit. */
export interface OutputUnits { length: string; force: string; lengthFactor: number; forceFactor: number }

/** Round to 12 significant digits and snap numerical noise (below 1e-10 of `scale`) to 0. */
export function tidy(v: number, scale = 1): number {
  if (!Number.isFinite(v)) return v;
  if (Math.abs(v) <= 1e-10 * Math.abs(scale)) return 0;
  return Number(v.toPrecision(12));
}

const maxAbs = (a: ArrayLike<number>) => {
  let m = 0;
  for (let i = 0; i < a.length; i++) m = Math.max(m, Math.abs(a[i]));
  return m;
};

/** Build the JSON document of one analysis. */
export function analysisJson(st: Structure, an: Analysis, units: OutputUnits, sections: { loading: string; result: SectionResult }[] = []) {
  const c = an.classification;
  const F = 1 / units.forceFactor;
  const Lf = 1 / units.lengthFactor;
  const ids = (idx: readonly number[], names: readonly string[]) => idx.map((i) => names[i]);
  const results: Record<string, unknown> = {};
  const cases: Record<string, unknown> = {};
  for (const r of [...an.results, ...an.caseResults]) {
    const fs = maxAbs(r.forces) * F;
    const us = maxAbs(r.disp) * Lf;
    const memberForces: Record<string, number> = {};
    st.memberIds.forEach((id, e) => (memberForces[id] = tidy(r.forces[e] * F, fs)));
    const reactions: Record<string, { rx: number; ry: number }> = {};
    st.supports.forEach((s, q) => (reactions[st.nodeIds[s.node]] = { rx: tidy(r.react[2 * q] * F, fs), ry: tidy(r.react[2 * q + 1] * F, fs) }));
    const displacements: Record<string, { ux: number; uy: number }> = {};
    st.nodeIds.forEach((id, i) => (displacements[id] = { ux: tidy(r.disp[2 * i] * Lf, us), uy: tidy(r.disp[2 * i + 1] * Lf, us) }));
    const p = r.peak;
    (an.results.includes(r) ? results : cases)[r.id] = {
      kind: r.kind,
      ...(r.source ? { source: r.source } : {}),
      memberForces, reactions, displacements,
      peak: {
        tension: p.tension ? { member: st.memberIds[p.tension.member], force: tidy(p.tension.force * F) } : null,
        compression: p.compression ? { member: st.memberIds[p.compression.member], force: tidy(p.compression.force * F) } : null,
        maxDisplacement: { node: st.nodeIds[p.maxDisplacement.node], value: tidy(p.maxDisplacement.value * Lf) },
      },
      checks: {
        equilibriumResidual: Number((r.residual * F).toExponential(3)),
        ...(r.staticsDifference !== undefined ? { staticsDifference: Number((r.staticsDifference * F).toExponential(3)) } : {}),
      },
    };
  }
  return {
    model: st.name,
    units: { length: units.length, force: units.force },
    /** Members as analysed: end joints, length (model length unit) and group. */
    members: st.memberIds.map((id, e) => ({
      id, from: st.nodeIds[st.from[e]], to: st.nodeIds[st.to[e]],
      length: tidy(Math.hypot(st.x[st.to[e]] - st.x[st.from[e]], st.y[st.to[e]] - st.y[st.from[e]]) * Lf),
      ...(st.groups?.[e] ? { group: st.groups[e] } : {}),
    })),
    classification: {
      joints: c.joints, members: c.members, reactions: c.reactions, countRule: c.countRule, rank: c.rank,
      mechanisms: c.mechanisms, selfStress: c.selfStress, status: c.status, degree: c.degree, critical: c.critical,
      conditioning: Number(c.conditioning.toPrecision(4)), nearlyMechanism: c.nearlyMechanism,
      specialGeometry: c.specialGeometry, pivotMechanisms: an.pivotMechanisms,
      mechanismModes: c.mechanismModes.map((m) => ({
        joints: ids(m.joints, st.nodeIds),
        displacements: Object.fromEntries(m.joints.map((i) => [st.nodeIds[i], { ux: tidy(m.displacement[2 * i]), uy: tidy(m.displacement[2 * i + 1]) }])),
      })),
      selfStressStates: c.selfStressStates.map((s) => ({
        members: Object.fromEntries(s.members.map((e) => [st.memberIds[e], tidy(s.forces[e])])),
        reactions: s.reactions.map((q) => {
          const rc = c.reactionComponents[q];
          return { node: st.nodeIds[rc.node], angle: tidy((rc.angle * 180) / Math.PI), value: tidy(s.forces[c.members + q]) };
        }),
      })),
      redundantMembers: ids(c.redundantMembers, st.memberIds),
      rigidity: {
        genericMechanisms: c.rigidity.genericMechanisms,
        genericSelfStress: c.rigidity.genericSelfStress,
        redundantMembers: ids(c.rigidity.redundantMembers, st.memberIds),
        overBracedMembers: ids(c.rigidity.overBracedMembers, st.memberIds),
        looseJoints: ids(c.rigidity.looseJoints, st.nodeIds),
        clusters: c.rigidity.clusters.map((k) => ({ joints: ids(k.joints, st.nodeIds), members: ids(k.members, st.memberIds), grounded: k.grounded })),
      },
      findings: c.findings,
    },
    results,
    /** Each load case alone (factor 1), when the results above are combinations. */
    cases,
    sections: sections.map(({ loading, result }) => {
      const stiff = an.results.find((r) => r.id === loading);
      return {
        loading,
        members: ids(result.members, st.memberIds),
        freeBody: ids(result.side, st.nodeIds),
        ...(result.error
          ? { error: result.error }
          : {
              forces: Object.fromEntries(result.members.map((e, k) => [st.memberIds[e], tidy(result.forces![k] * F)])),
              stiffness: Object.fromEntries(result.members.map((e) => [st.memberIds[e], tidy((stiff?.forces[e] ?? NaN) * F)])),
            }),
      };
    }),
    cautions: CAUTIONS,
  };
}

/** The type of the analyze JSON document. */
export type AnalysisJson = ReturnType<typeof analysisJson>;
