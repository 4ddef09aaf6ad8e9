/**
 * Findings: sentences that say where a frame is weak or over-braced, for the report, the web app
 * and the sweep's failure reasons. Built from the classification; no numbers are changed here.
 */
import type { Structure } from './structure';
import type { Classification } from './classify';
import { reactionLines } from './reaction-lines';
import { findPanels, stretches } from './panels';

/** One finding about a frame. */
export interface Finding {
  readonly level: 'error' | 'warning' | 'info';
  readonly code: string;
  readonly message: string;
  readonly joints?: string[];
  readonly members?: string[];
}

type Base = Omit<Classification, 'findings'>;

const list = (ids: readonly string[], max = 12): string =>
  ids.length <= max ? ids.join(', ') : `${ids.slice(0, max).join(', ')} and ${ids.length - max} more`;

/** Derive the findings of a classified frame. */
export function geometryFindings(st: Structure, c: Base): Finding[] {
  const out: Finding[] = [];
  const J = (idx: readonly number[]) => idx.map((i) => st.nodeIds[i]);
  const M = (idx: readonly number[]) => idx.map((e) => st.memberIds[e]);
  if (c.countRule < 0) {
    out.push({ level: 'error', code: 'count-short', message: `Maxwell's count is short: m + r − 2j = −${-c.countRule}; at least ${-c.countRule} more member(s) or reaction component(s) are needed.` });
  } else if (c.critical) {
    out.push({ level: 'error', code: 'critical-form', message: `The count is satisfied (m + r − 2j = ${c.countRule}) yet the geometry leaves ${c.mechanisms} mechanism(s): some members or reactions are dependent.` });
  }
  const lines = reactionLines(st, c.reactionComponents);
  if (lines.parallel && c.reactions >= 2) {
    out.push({ level: 'error', code: 'reactions-parallel', message: 'All reaction components are parallel: nothing resists movement across them.' });
  } else if (lines.concurrent && c.reactions === 3) {
    const [px, py] = lines.concurrent;
    out.push({ level: 'error', code: 'reactions-concurrent', message: `The three reaction lines meet at one point (x = ${px.toFixed(3)} m, y = ${py.toFixed(3)} m): the frame can turn about it.` });
  }
  const degree = new Int32Array(st.nodeIds.length);
  for (let e = 0; e < st.from.length; e++) { degree[st.from[e]]++; degree[st.to[e]]++; }
  const supported = new Set(st.supports.map((s) => s.node));
  for (let i = 0; i < st.nodeIds.length; i++) {
    if (supported.has(i)) continue;
    if (degree[i] === 0) out.push({ level: 'error', code: 'joint-unconnected', message: `Joint ${st.nodeIds[i]} has no members and no support.`, joints: [st.nodeIds[i]] });
    if (degree[i] === 1) out.push({ level: 'error', code: 'joint-dangling', message: `Joint ${st.nodeIds[i]} hangs on a single member: it can swing about the other end.`, joints: [st.nodeIds[i]] });
    if (degree[i] === 2 && twoMembersCollinear(st, i)) {
      out.push({ level: 'error', code: 'flat-kink', message: `Joint ${st.nodeIds[i]} sits on a straight line between its only two members: it can move across that line.`, joints: [st.nodeIds[i]] });
    }
  }
  c.mechanismModes.forEach((mode, n) => {
    const moving = J(mode.joints);
    const whole = mode.joints.length === st.nodeIds.length && isRigidBody(st, mode.displacement);
    out.push({
      level: 'error', code: 'mechanism', joints: moving,
      message: whole
        ? `Mechanism ${n + 1}: the whole frame moves as one body — the supports do not hold it.`
        : `Mechanism ${n + 1} moves joint(s) ${list(moving)}.`,
    });
  });
  const panels = c.mechanismModes.length || c.selfStressStates.length ? findPanels(st) : [];
  const name = (p: (typeof panels)[number]) => p.joints.map((i) => st.nodeIds[i]).join('–');
  const sheared = panels.filter((p) => p.diagonals[0] < 0 && p.diagonals[1] < 0 && c.mechanismModes.some((m) => stretches(st, m.displacement, p.joints[0], p.joints[2]) || stretches(st, m.displacement, p.joints[1], p.joints[3])));
  for (const p of sheared.slice(0, 6)) {
    out.push({ level: 'error', code: 'panel-unbraced', joints: p.joints.map((i) => st.nodeIds[i]), message: `Panel ${name(p)} has no diagonal: the mechanism shears it. Add a diagonal across it.` });
  }
  const stressed = new Set(c.selfStressStates.flatMap((s) => s.members));
  for (const p of panels.filter((q) => q.diagonals[0] >= 0 && q.diagonals[1] >= 0 && stressed.has(q.diagonals[0]) && stressed.has(q.diagonals[1])).slice(0, 6)) {
    out.push({ level: 'info', code: 'panel-double-braced', members: M(p.diagonals), joints: p.joints.map((i) => st.nodeIds[i]), message: `Panel ${name(p)} has two diagonals (${M(p.diagonals).join(', ')}): one of them is redundant.` });
  }
  const loose = J(c.rigidity.looseJoints);
  if (loose.length && c.mechanisms > 0) {
    out.push({ level: 'warning', code: 'under-braced', joints: loose, message: `Under-braced (pebble game): joint(s) ${list(loose)} are not rigidly tied to the supports.` });
  }
  c.selfStressStates.forEach((state, n) => {
    const ms = M(state.members);
    const rs = state.reactions.map((q) => {
      const rc = c.reactionComponents[q];
      return `${st.nodeIds[rc.node]}${st.supports[rc.support].kind === 'pin' ? (rc.angle === 0 ? '.x' : '.y') : ''}`;
    });
    const what = [ms.length ? `member(s) ${list(ms)}` : '', rs.length ? `reaction(s) at ${list(rs)}` : ''].filter(Boolean).join(' and ');
    out.push({ level: 'info', code: 'self-stress', members: ms, message: `Self-stress state ${n + 1} runs through ${what}: releasing any one of them removes this redundancy without adding a mechanism.` });
  });
  const over = M(c.rigidity.overBracedMembers);
  if (over.length) {
    out.push({ level: 'info', code: 'over-braced', members: over, message: `Over-braced (pebble game): member(s) ${list(over)} lie in a region with more bars than it needs.` });
  }
  if (c.specialGeometry) {
    out.push({
      level: 'warning', code: 'special-geometry',
      message: `The connectivity alone (pebble game) gives k = ${c.rigidity.genericMechanisms}, s = ${c.rigidity.genericSelfStress}, but the geometry gives k = ${c.mechanisms}, s = ${c.selfStress}: members or reactions are collinear, parallel or concurrent.`,
    });
  }
  if (c.nearlyMechanism) {
    out.push({ level: 'warning', code: 'near-mechanism', message: `Nearly a mechanism: conditioning ${c.conditioning.toExponential(2)}. Forces are very sensitive to the geometry; check shallow or nearly collinear members.` });
  }
  return out;
}

function twoMembersCollinear(st: Structure, i: number): boolean {
  const dirs: [number, number][] = [];
  for (let e = 0; e < st.from.length; e++) {
    const o = st.from[e] === i ? st.to[e] : st.to[e] === i ? st.from[e] : -1;
    if (o < 0) continue;
    const dx = st.x[o] - st.x[i];
    const dy = st.y[o] - st.y[i];
    const L = Math.hypot(dx, dy);
    dirs.push([dx / L, dy / L]);
  }
  return dirs.length === 2 && Math.abs(dirs[0][0] * dirs[1][1] - dirs[0][1] * dirs[1][0]) < 1e-9;
}

/** Does d match a rigid-body motion (tx − ω·y, ty + ω·x) of the whole frame? */
function isRigidBody(st: Structure, d: Float64Array): boolean {
  const n = st.nodeIds.length;
  // Least squares for (tx, ty, ω) by normal equations.
  let sx = 0, sy = 0, sxx = 0, syy = 0, su = 0, sv = 0, sw = 0;
  for (let i = 0; i < n; i++) {
    sx += st.x[i]; sy += st.y[i]; sxx += st.x[i] ** 2; syy += st.y[i] ** 2;
    su += d[2 * i]; sv += d[2 * i + 1]; sw += st.x[i] * d[2 * i + 1] - st.y[i] * d[2 * i];
  }
  const m = [n, 0, -sy, 0, n, sx, -sy, sx, sxx + syy];
  const b = [su, sv, sw];
  const det = (q: number[]) => q[0] * (q[4] * q[8] - q[5] * q[7]) - q[1] * (q[3] * q[8] - q[5] * q[6]) + q[2] * (q[3] * q[7] - q[4] * q[6]);
  const D = det(m);
  if (Math.abs(D) < 1e-12) return false;
  const sol = [0, 1, 2].map((k) => det(m.map((v, idx) => (idx % 3 === k ? b[Math.floor(idx / 3)] : v))) / D);
  let res = 0;
  for (let i = 0; i < n; i++) {
    res += (d[2 * i] - (sol[0] - sol[2] * st.y[i])) ** 2 + (d[2 * i + 1] - (sol[1] + sol[2] * st.x[i])) ** 2;
  }
  return Math.sqrt(res / n) < 1e-6;
}
