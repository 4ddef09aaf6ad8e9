// Member design in the analyze report: chosen sections per group, each member's utilisation and
// governing check with its clause, weight and deflection; the JSON beside it.
import type { SizedStructure } from '../../shared/design/size-structure';
import type { OutputUnits } from '../../shared/report/analysis-json';
import { num, table } from './text-table';

/** The `design` key of the analyze JSON (weights kN and kg, deflection in the model's length unit). */
export function designJson(s: SizedStructure, units: OutputUnits) {
  const r = s.report;
  if (!r) return { status: 'invalid', issues: s.issues };
  return { ...r, maxDeflection: r.maxDeflection === null ? null : r.maxDeflection / units.lengthFactor, selfWeightCase: s.selfWeightCase || null };
}

/** The DESIGN section of the text report. */
export function designText(s: SizedStructure): string {
  const r = s.report;
  const out: string[] = ['', 'MEMBER DESIGN'];
  if (!r || r.status === 'analysis-failed') {
    out.push(`  not sized: ${(s.issues.map((i) => i.message).join('; ')) || 'the frame cannot be analysed (unstable)'}`);
    return out.join('\n') + '\n';
  }
  const verdict = { sized: 'every member passes', unsizable: 'SOME GROUPS HAVE NO PASSING SECTION', 'not-settled': 'the choice did not settle', 'analysis-failed': '' }[r.status];
  out.push(`  ${r.code} · ${r.material} · catalogue ${r.catalogue} · ${verdict} (${r.iterations} analyses${s.selfWeightCase ? ', self-weight in case D' : ', no self-weight (no case D)'})`);
  out.push(`  weight ${num(r.weightKN, 2)} kN (${num(r.massKg, 0)} kg) · largest utilisation ${num(r.maxUtilisation, 3)} in ${r.maxUtilisationMember}` +
    (r.deflectionLimit ? ` · span/deflection ${r.spanOverDeflection === null ? '—' : num(r.spanOverDeflection, 0)} against span/${r.deflectionLimit}: ${r.deflectionOk ? 'ok' : 'FAILS'}` : ''));
  out.push('', table(
    [{ head: 'group' }, { head: 'section' }, { head: 'worst member' }, { head: 'utilisation', right: true }, { head: 'passes' }],
    r.groups.map((g) => [g.name, g.sectionName, g.worstMember, num(g.utilisation, 3), g.ok ? 'yes' : 'NO']),
  ));
  out.push('', table(
    [{ head: 'member' }, { head: 'group' }, { head: 'section' }, { head: 'utilisation', right: true }, { head: 'governing check' }, { head: 'combination' }],
    r.members.map((m) => [m.id, m.group, m.sectionName, num(m.utilisation, 3), m.check, m.combination]),
  ));
  for (const i of r.issues) out.push(`  ! ${i.path ? `${i.path}: ` : ''}${i.message}`);
  out.push('  Forces above are those of the sized members. Not checked: connections, out-of-plane and lateral bracing, fatigue,',
    '  vibration, second-order effects. Review by a licensed engineer under the governing code.');
  return out.join('\n') + '\n';
}
