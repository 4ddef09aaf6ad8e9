// `panelpoint families [ID]`: the truss families a study can name, their parameters, and the
// joint and member ids each one gives (to point loads at joints and read results by member).
import type { Command } from 'commander';
import { families, getFamily, withDefaults } from '../../shared/families/registry';
import type { FamilyTopology, ParamSpec, TrussFamily } from '../../shared/families/types';
import { suggest } from '../../shared/sweep/suggest';
import { UsageError, type Io } from '../context';
import { table } from '../report/text-table';

interface Options { json?: boolean }

export function registerFamilies(program: Command, io: Io): void {
  program
    .command('families')
    .description('List the truss families and their parameters; with an id, show one family and its joint and member ids.')
    .argument('[id]', 'family id, e.g. pratt')
    .option('--json', 'print JSON instead of tables')
    .addHelpText('after', '\nExamples:\n  panelpoint families\n  panelpoint families pratt\n  panelpoint families --json\n')
    .action((id: string | undefined, opts: Options) => runFamilies(id, opts, io));
}

/** The family with this id, or a UsageError listing the known ids. */
export function familyOrThrow(id: string): TrussFamily {
  const f = getFamily(id);
  if (f) return f;
  const ids = families.map((x) => x.id);
  throw new UsageError(`unknown family '${id}'${suggest(id, ids)}; known: ${ids.join(', ')}`);
}

function runFamilies(id: string | undefined, opts: Options, io: Io): void {
  if (id === undefined) {
    io.out(opts.json ? JSON.stringify({ families: families.map(familyJson) }, null, 2) + '\n' : listText());
    return;
  }
  const f = familyOrThrow(id);
  io.out(opts.json ? JSON.stringify(familyDetailJson(f), null, 2) + '\n' : detailText(f));
}

/** Compress ids such as B0 B1 ... B8 T0 ... T8 C into "B0..B8, T0..T8, C" (prefixes in order of first appearance). */
export function idScheme(ids: readonly string[]): string {
  const byPrefix = new Map<string, { bare: boolean; numbers: number[] }>();
  for (const id of ids) {
    const m = /^(.*?)(\d+)$/.exec(id);
    const prefix = m ? m[1] : id;
    const entry = byPrefix.get(prefix) ?? { bare: false, numbers: [] };
    if (m) entry.numbers.push(Number(m[2]));
    else entry.bare = true;
    byPrefix.set(prefix, entry);
  }
  const parts: string[] = [];
  for (const [prefix, { bare, numbers }] of byPrefix) {
    if (bare) parts.push(prefix);
    const sorted = [...new Set(numbers)].sort((a, b) => a - b);
    for (let i = 0; i < sorted.length; ) {
      let j = i;
      while (j + 1 < sorted.length && sorted[j + 1] === sorted[j] + 1) j++;
      if (j - i >= 2) parts.push(`${prefix}${sorted[i]}..${prefix}${sorted[j]}`);
      else for (let k = i; k <= j; k++) parts.push(`${prefix}${sorted[k]}`);
      i = j + 1;
    }
  }
  return parts.join(', ');
}

const GROUP_NAMES: Record<string, string> = {
  top: 'top chord', bottom: 'bottom chord', diagonal: 'diagonals', vertical: 'verticals', link: 'links', web: 'web members',
};

/** Member id prefixes in order of first appearance, each with its group and its ids. */
function memberGroups(topo: FamilyTopology): { prefix: string; group: string; ids: string[] }[] {
  const out: { prefix: string; group: string; ids: string[] }[] = [];
  topo.memberIds.forEach((id, e) => {
    const prefix = id.replace(/\d+$/, '');
    let g = out.find((x) => x.prefix === prefix);
    if (!g) out.push((g = { prefix, group: topo.groups[e], ids: [] }));
    g.ids.push(id);
  });
  return out;
}

const degrees = (rad: number) => Number(((rad * 180) / Math.PI).toFixed(6));

/** The default topology of a family, described: ids, chords, supports. */
export function topologyOf(f: TrussFamily) {
  const p = withDefaults(f, {});
  const topo = f.topology(p);
  const groups = memberGroups(topo);
  return {
    at: Object.fromEntries(f.params.map((s) => [s.name, p[s.name]])),
    joints: topo.nodeIds.length,
    members: topo.memberIds.length,
    jointIds: idScheme(topo.nodeIds),
    memberPrefixes: groups.map((g) => g.prefix),
    memberGroups: groups.map((g) => ({ prefix: g.prefix, group: g.group, ids: idScheme(g.ids), count: g.ids.length })),
    topChord: Array.from(topo.topChord, (j) => topo.nodeIds[j]),
    bottomChord: Array.from(topo.bottomChord, (j) => topo.nodeIds[j]),
    supports: topo.supports.map((s) => (s.kind === 'pin'
      ? { joint: topo.nodeIds[s.node], type: 'pin' as const }
      : { joint: topo.nodeIds[s.node], type: 'roller' as const, angle: degrees(s.angle) })),
  };
}

function familyJson(f: TrussFamily) {
  return { id: f.id, category: f.category, name: f.name, summary: f.summary, params: f.params.map((s) => ({ ...s })) };
}

function familyDetailJson(f: TrussFamily) {
  return { ...familyJson(f), topology: topologyOf(f) };
}

const range = (s: ParamSpec) =>
  s.min === undefined && s.max === undefined ? '' : `${s.min ?? ''}–${s.max ?? ''}${s.integer ? ' (whole)' : ''}`;

function paramTable(f: TrussFamily): string {
  return table(
    [{ head: 'parameter' }, { head: 'unit' }, { head: 'default', right: true }, { head: 'min–max' }, { head: 'options' }, { head: 'description' }],
    f.params.map((s) => [s.name, s.unit, String(s.default), range(s), (s.options ?? []).join(', '), s.description]),
  );
}

/** Wrap text at `width` columns with an indent. */
function wrap(text: string, indent = '  ', width = 100): string {
  const lines: string[] = [];
  let line = '';
  for (const word of text.split(/\s+/)) {
    if (line && indent.length + line.length + 1 + word.length > width) {
      lines.push(indent + line);
      line = word;
    } else line = line ? `${line} ${word}` : word;
  }
  if (line) lines.push(indent + line);
  return lines.join('\n');
}

function listText(): string {
  const out = [`FAMILIES (${families.length})`, table(
    [{ head: 'id' }, { head: 'category' }, { head: 'name' }, { head: 'summary' }],
    families.map((f) => [f.id, f.category, f.name, f.summary]),
  )];
  for (const f of families) out.push('', `${f.id} — ${f.name} (${f.category})`, wrap(f.summary), paramTable(f));
  out.push('', 'Run `panelpoint families ID` for one family with its joint and member ids, `panelpoint new ID` for a starter study.');
  return out.join('\n') + '\n';
}

function detailText(f: TrussFamily): string {
  const t = topologyOf(f);
  const at = Object.entries(t.at).map(([k, v]) => `${k}=${v}`).join(', ');
  const supports = t.supports.map((s) => (s.type === 'pin' ? `${s.joint} pin` : `${s.joint} roller (reaction at ${s.angle}°)`)).join(', ');
  const out = [
    `${f.id} — ${f.name} (${f.category})`, wrap(f.summary), '', 'PARAMETERS', paramTable(f), '',
    `IDS at the defaults (${at})`,
    `  joints ${t.jointIds}; members ${t.memberPrefixes.join(', ')}`,
    table(
      [{ head: 'ids' }, { head: 'count', right: true }, { head: 'what' }],
      [
        [t.jointIds, String(t.joints), 'joints, numbered along the span'],
        ...t.memberGroups.map((g) => [g.ids, String(g.count), GROUP_NAMES[g.group] ?? g.group]),
      ],
    ),
    `  top chord joints: ${t.topChord.join(' ')}`,
    `  bottom chord joints: ${t.bottomChord.join(' ')}`,
    `  supports: ${supports}`,
    '',
    'Ids follow the panel count: more panels give more joints and members under the same scheme.',
    `Start a study: panelpoint new ${f.id} --out ${f.id}-study.json`,
  ];
  return out.join('\n') + '\n';
}
