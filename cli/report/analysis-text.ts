// The readable report of `panelpoint analyze`: verdict first, then why, then tables with units.
import type { AnalysisJson } from '../../shared/report/analysis-json';
import { num, table } from './text-table';

const VERDICT: Record<string, string> = {
  unstable: 'UNSTABLE — the frame is a mechanism',
  determinate: 'STABLE — statically determinate',
  indeterminate: 'STABLE — statically indeterminate',
};

/** Displacements read better in mm than in m. */
function dispUnit(length: string): { unit: string; factor: number } {
  return length === 'm' ? { unit: 'mm', factor: 1000 } : { unit: length, factor: 1 };
}

/** Render the report. @param loadings - ids to print in full (all when empty) */
export function analysisText(doc: AnalysisJson, file: string, version: string, loadings: string[], withCases = false): string {
  const c = doc.classification;
  const { force } = doc.units;
  const du = dispUnit(doc.units.length);
  const out: string[] = [];
  out.push(`Panelpoint ${version} · ${file}`, `${doc.model}   (lengths ${doc.units.length}, forces ${force})`, '');
  const degree = c.status === 'indeterminate' ? ` to degree ${c.degree}` : '';
  out.push(`VERDICT  ${VERDICT[c.status]}${degree}${c.critical ? '  [critical: count satisfied, geometry fails]' : ''}`);
  out.push(
    `  joints j = ${c.joints}   members m = ${c.members}   reaction components r = ${c.reactions}`,
    `  Maxwell's count m + r − 2j = ${c.countRule}   rank of equilibrium matrix = ${c.rank}`,
    `  mechanisms k = ${c.mechanisms}   states of self-stress s = ${c.selfStress}   (s − k = ${c.selfStress - c.mechanisms}, Calladine)`,
    `  conditioning σmin/σmax = ${c.conditioning.toExponential(2)}   pebble game: k = ${c.rigidity.genericMechanisms}, s = ${c.rigidity.genericSelfStress}`,
  );
  if (c.findings.length) {
    out.push('', 'WHY AND WHERE');
    const mark = { error: '✗', warning: '!', info: '·' } as const;
    for (const f of c.findings) out.push(`  ${mark[f.level]} ${f.message}`);
  }
  if (c.mechanismModes.length) {
    out.push('', 'MECHANISM MODES (joint displacements, largest = 1)');
    c.mechanismModes.forEach((m, n) => {
      const rows = Object.entries(m.displacements).map(([id, d]) => [`${n + 1}`, id, num(d.ux, 3, true), num(d.uy, 3, true)]);
      out.push(table([{ head: 'mode' }, { head: 'joint' }, { head: 'ux', right: true }, { head: 'uy', right: true }], rows));
    });
  }
  const all = { ...doc.results, ...(withCases ? doc.cases : {}) };
  const ids = Object.keys(all);
  if (!ids.length) {
    out.push('', c.status === 'unstable' ? 'No forces: an unstable frame cannot carry general loads. Fix the mechanisms above first.' : 'No loads in the model.');
  } else {
    const shown = loadings.length ? ids.filter((id) => loadings.includes(id)) : ids;
    out.push('', `PEAKS (${force}, ${du.unit})`);
    out.push(table(
      [{ head: 'loading' }, { head: 'max tension' }, { head: force, right: true }, { head: 'max compression' }, { head: force, right: true }, { head: 'max displacement' }, { head: du.unit, right: true }, { head: 'statics check' }],
      shown.map((id) => {
        const r = all[id] as ResultJson;
        const p = r.peak;
        const check = r.checks.staticsDifference !== undefined ? `Δ ${r.checks.staticsDifference.toExponential(1)}` : `resid. ${r.checks.equilibriumResidual.toExponential(1)}`;
        return [id, p.tension?.member ?? '—', p.tension ? num(p.tension.force, 2, true) : '', p.compression?.member ?? '—', p.compression ? num(p.compression.force, 2, true) : '', p.maxDisplacement.node, num(p.maxDisplacement.value * du.factor, 2), check];
      }),
    ));
    const first = all[shown[0]] as ResultJson;
    out.push('', `MEMBER FORCES (${force}, tension +, T/C marked)`);
    out.push(table(
      [{ head: 'member' }, { head: 'joints' }, { head: `length ${doc.units.length}`, right: true }, ...shown.map((id) => ({ head: id, right: true }))],
      doc.members.map((m) => [m.id, `${m.from}–${m.to}`, num(m.length, 3), ...shown.map((id) => tc((all[id] as ResultJson).memberForces[m.id]))]),
    ));
    out.push('', `REACTIONS (${force}, global x right, y up)`);
    out.push(table(
      [{ head: 'joint' }, ...shown.flatMap((id) => [{ head: `${id} Rx`, right: true }, { head: `${id} Ry`, right: true }])],
      Object.keys(first.reactions).map((n) => [n, ...shown.flatMap((id) => {
        const r = (all[id] as ResultJson).reactions[n];
        return [num(r.rx, 2), num(r.ry, 2)];
      })]),
    ));
    out.push('', `DISPLACEMENTS (${du.unit})`);
    out.push(table(
      [{ head: 'joint' }, ...shown.flatMap((id) => [{ head: `${id} ux`, right: true }, { head: `${id} uy`, right: true }])],
      Object.keys(first.displacements).map((n) => [n, ...shown.flatMap((id) => {
        const d = (all[id] as ResultJson).displacements[n];
        return [num(d.ux * du.factor, 3), num(d.uy * du.factor, 3)];
      })]),
    ));
  }
  for (const s of doc.sections) {
    out.push('', `METHOD OF SECTIONS — cut ${s.members.join(', ')} (${s.loading}), free body: ${s.freeBody.join(', ')}`);
    if ('error' in s) out.push(`  cannot solve: ${s.error}`);
    else {
      const { forces, stiffness } = s;
      out.push(table(
        [{ head: 'member' }, { head: `statics ${force}`, right: true }, { head: `stiffness ${force}`, right: true }],
        s.members.map((m) => [m, tc(forces[m]), tc(stiffness[m])]),
      ));
    }
  }
  out.push('', 'CAUTIONS', ...doc.cautions.map((t) => `  ${t}`));
  return out.join('\n') + '\n';
}

type ResultJson = {
  memberForces: Record<string, number>;
  reactions: Record<string, { rx: number; ry: number }>;
  displacements: Record<string, { ux: number; uy: number }>;
  peak: { tension: { member: string; force: number } | null; compression: { member: string; force: number } | null; maxDisplacement: { node: string; value: number } };
  checks: { equilibriumResidual: number; staticsDifference?: number };
};

function tc(v: number): string {
  const t = num(v, 2, true);
  return Math.abs(v) < 0.005 ? `${num(0, 2)}  ` : `${t} ${v > 0 ? 'T' : 'C'}`;
}
