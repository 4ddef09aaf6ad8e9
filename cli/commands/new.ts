// `panelpoint new FAMILY`: a starter study for one family that sweeps as written: the family's
// defaults held, the panel count and the depth (or rise) varied, a filter, roof loads, a preset.
import type { Command } from 'commander';
import { existsSync } from 'node:fs';
import { Study } from '../../shared/schemas/study';
import { withDefaults } from '../../shared/families/registry';
import type { ParamSpec, Params, TrussFamily } from '../../shared/families/types';
import { resolveStudy } from '../../shared/sweep/resolve-study';
import { UsageError, type Io } from '../context';
import { writeFileAtomic } from '../io/write-atomic';
import { familyOrThrow } from './families';

interface Options { out?: string; force?: boolean }

export function registerNew(program: Command, io: Io): void {
  program
    .command('new')
    .description('Write a starter study for a truss family (to stdout, or to --out).')
    .argument('<family>', 'family id (see `panelpoint families`)')
    .option('-o, --out <file>', 'write the study to this file (whole or not at all)')
    .option('-f, --force', 'replace --out if it exists')
    .addHelpText('after', '\nExamples:\n  panelpoint new pratt --out depot.json\n  panelpoint sweep depot.json --out out/depot\n')
    .action((family: string, opts: Options) => runNew(family, opts, io));
}

/** Where editors find the Study schema (its $id). */
export const STUDY_SCHEMA_URL = String(Study.$id);

const round = (v: number) => Number(v.toPrecision(6));

/** True when the family accepts `p` over its defaults. */
const accepts = (f: TrussFamily, p: Params) => f.check(withDefaults(f, p)).length === 0;

/** Panel counts near the default that the family accepts (its parity or set rule), ascending. */
function panelValues(f: TrussFamily, spec: ParamSpec): number[] {
  const d = spec.default as number;
  const tried = [d - 2, d, d + 2, d + 4].filter((n) => n >= (spec.min ?? 1) && n <= (spec.max ?? Infinity));
  return tried.filter((n) => accepts(f, { [spec.name]: n })).slice(0, 3);
}

/** The shape parameter to vary: depth, else rise, else the first other length, else span. */
function shapeParam(f: TrussFamily): ParamSpec {
  const lengths = f.params.filter((s) => s.unit === 'm' && typeof s.default === 'number');
  return lengths.find((s) => s.name === 'depth') ?? lengths.find((s) => s.name === 'rise') ?? lengths.find((s) => s.name !== 'span') ?? lengths[0];
}

/** Five values from half to one and a half times the default, inside the parameter's bounds. */
function shapeRange(spec: ParamSpec): { from: number; to: number; count: number } {
  const d = spec.default as number;
  return { from: round(Math.max(spec.min ?? 0, d / 2)), to: round(Math.min(spec.max ?? Infinity, 1.5 * d)), count: 5 };
}

/**
 * A starter study for `f`: every default in `fixed` except the two varied parameters (panels
 * near the default, and depth or rise over five values), a span-to-depth filter, dead, snow
 * and wind area loads on the top chord at 6 m spacing, ASCE/SEI 7 LRFD combinations and
 * the smallest peak member force as objective.
 */
export function starterStudy(f: TrussFamily): Study {
  const defaults = withDefaults(f, {});
  const panels = f.params.find((s) => s.name === 'panels' && s.integer);
  const shape = shapeParam(f);
  const vary: Study['vary'] = {};
  const panelList = panels ? panelValues(f, panels) : [];
  if (panels && panelList.length >= 2) vary[panels.name] = panelList;
  const range = shapeRange(shape);
  vary[shape.name] = range;
  const fixed: Record<string, number | string> = {};
  for (const s of f.params) if (!(s.name in vary)) fixed[s.name] = defaults[s.name];
  const study: Study = {
    $schema: STUDY_SCHEMA_URL,
    name: `${f.name} starter study`,
    description: `Written by \`panelpoint new ${f.id}\`: ${f.name} trusses at 6 m centres; edit the ranges, loads and combinations to suit the project. Parameters and ids: \`panelpoint families ${f.id}\`.`,
    family: f.id,
    fixed,
    vary,
  };
  const span = typeof fixed.span === 'number' ? fixed.span : undefined;
  if (span !== undefined && shape.name !== 'span') {
    // Keep all but the shallowest value: an example of a filter that drops something.
    const step = (range.to - range.from) / (range.count - 1);
    study.where = [`span / ${shape.name} <= ${Math.ceil(span / (range.from + step))}`];
  }
  study.loads = [
    { case: 'D', kind: 'area', value: '0.45 kPa', spacing: '6 m', chord: 'top', projection: 'length' },
    { case: 'D', kind: 'self-weight' },
    { case: 'S', kind: 'area', value: '0.75 kPa', spacing: '6 m', chord: 'top' },
    { case: 'W', kind: 'area', value: '-0.5 kPa', spacing: '6 m', chord: 'top' },
  ];
  study.combinations = { preset: 'asce7-lrfd' };
  study.objective = { minimize: 'maxAbsForce' };
  return study;
}

/** JSON with two-space indents, each value on one line when it fits in 120 columns (like examples/studies). */
export function studyText(value: unknown, indent = ''): string {
  const flat = (v: unknown): string => {
    if (Array.isArray(v)) return `[${v.map(flat).join(', ')}]`;
    if (v && typeof v === 'object') {
      const body = Object.entries(v).map(([k, x]) => `${JSON.stringify(k)}: ${flat(x)}`).join(', ');
      return body ? `{ ${body} }` : '{}';
    }
    return JSON.stringify(v);
  };
  const one = flat(value);
  if (!value || typeof value !== 'object' || (indent && indent.length + one.length <= 120)) return one;
  const inner = `${indent}  `;
  const items = Array.isArray(value)
    ? value.map((x) => inner + studyText(x, inner))
    : Object.entries(value).map(([k, x]) => `${inner}${JSON.stringify(k)}: ${studyText(x, inner)}`);
  const [open, close] = Array.isArray(value) ? ['[', ']'] : ['{', '}'];
  return `${open}\n${items.join(',\n')}\n${indent}${close}`;
}

function runNew(id: string, opts: Options, io: Io): void {
  const f = familyOrThrow(id);
  const study = starterStudy(f);
  const resolved = resolveStudy(study);
  if (!resolved.setup) throw new Error(`the starter study of ${f.id} does not resolve: ${resolved.issues.map((i) => `${i.path}: ${i.message}`).join('; ')}`);
  const text = studyText(study) + '\n';
  if (!opts.out) {
    io.out(text);
    return;
  }
  if (existsSync(opts.out) && !opts.force) throw new UsageError(`${opts.out} exists; add --force to replace it`);
  writeFileAtomic(opts.out, text);
  const size = resolved.setup.plan.size.toLocaleString('en-US');
  io.err(`wrote ${opts.out}: ${f.name}, ${size} variants before filters; run it with\n  panelpoint sweep ${opts.out}\n`);
}
