// `panelpoint freeze FILE|RUN:VARIANT --out CASE.json`: analyse a model file, or rebuild one variant
// of a sweep, and write what it gives as a reference case for `panelpoint check`.
import type { Command } from 'commander';
import { existsSync, statSync } from 'node:fs';
import { dirname, relative, resolve, sep } from 'node:path';
import { analyze } from '../../shared/engine/analyze';
import { toStructure } from '../../shared/engine/to-structure';
import { analysisJson } from '../../shared/report/analysis-json';
import { ReferenceCase, type ReferenceSource } from '../../shared/schemas/reference-case';
import type { Model } from '../../shared/schemas/model';
import { DEFAULT_TOLERANCE, frozenCase } from '../../shared/reference/freeze';
import { InputError } from '../../shared/errors';
import { loadModelFile } from '../io/read-json';
import { writeFileAtomic } from '../io/write-atomic';
import { loadRunVariant, splitRunVariant, type VariantLine } from '../reference/run-variant';
import { UsageError, VERSION, type Io } from '../context';

interface Options {
  out: string; name?: string; sourceKind: string; citation?: string; inline?: boolean; loadings: string[];
  toleranceRel?: string; toleranceForce?: string; toleranceDisplacement?: string;
}

export function registerFreeze(program: Command, io: Io): void {
  program
    .command('freeze')
    .description('Write a reference case from what a model (or one variant of a sweep) gives now, for `panelpoint check`.')
    .argument('<source>', 'a model file, or RUN:VARIANT: a sweep output folder and a variant index or id')
    .requiredOption('-o, --out <file>', 'the reference case file to write (whole or not at all)')
    .option('--name <text>', 'name of the case (default: the model name)')
    .option('--source-kind <kind>', "where the values come from: 'demo', 'closed-form' or 'published'", 'demo')
    .option('--citation <text>', "the source of the values (required unless --source-kind demo)")
    .option('--inline', 'put the model in the case instead of referring to the model file (always so for RUN:VARIANT)')
    .option('--loadings <ids>', 'keep only these combinations or load cases (comma-separated; repeatable)', collect, [])
    .option('--tolerance-rel <x>', `relative tolerance (default ${DEFAULT_TOLERANCE.relative})`)
    .option('--tolerance-force <kN>', `absolute tolerance on forces and reactions, kN (default ${DEFAULT_TOLERANCE.absolute.force})`)
    .option('--tolerance-displacement <m>', `absolute tolerance on displacements, m (default ${DEFAULT_TOLERANCE.absolute.displacement})`)
    .addHelpText('after', '\nExamples:\n  panelpoint freeze examples/models/depot-roof-r3.json --out examples/reference/depot-roof-r3.json\n  panelpoint freeze out/depot:17 --out tests/reference/depot-17.json\n')
    .action((source: string, opts: Options) => runFreeze(source, opts, io));
}

const collect = (value: string, previous: string[]) => [...previous, value];

function nonNegative(text: string | undefined, flag: string, fallback: number): number {
  if (text === undefined) return fallback;
  const v = Number(text);
  if (!(text.trim() !== '' && Number.isFinite(v) && v >= 0)) throw new UsageError(`${flag} takes a number ≥ 0, not '${text}'`);
  return v;
}

function sourceOf(opts: Options, from: string): ReferenceSource {
  const kinds = ['demo', 'closed-form', 'published'];
  if (!kinds.includes(opts.sourceKind)) throw new UsageError(`--source-kind takes ${kinds.map((k) => `'${k}'`).join(', ')}, not '${opts.sourceKind}'`);
  if (opts.sourceKind !== 'demo' && !opts.citation) throw new UsageError(`--source-kind ${opts.sourceKind} needs --citation naming the source`);
  const citation = opts.citation ?? `Frozen from ${from} by panelpoint freeze ${VERSION}: a regression reference, not an independent check.`;
  return { kind: opts.sourceKind as ReferenceSource['kind'], citation };
}

/** The model and where it came from. */
interface Frozen { model: Model; from: string; ref: ReferenceCase['model']; line?: VariantLine }

function fromSource(source: string, opts: Options): Frozen {
  const isDir = existsSync(source) && statSync(source).isDirectory();
  if (isDir) throw new UsageError(`${source} is a folder: to freeze a sweep variant give RUN:VARIANT, e.g. ${source}:0`);
  const split = existsSync(source) ? undefined : splitRunVariant(source);
  if (split && existsSync(split.dir) && statSync(split.dir).isDirectory()) {
    const v = loadRunVariant(split.dir, split.variant);
    return { model: v.model, from: `${v.studyFile} variant ${v.line.index} (${v.line.id}), run ${split.dir}`, ref: v.model, line: v.line };
  }
  const loaded = loadModelFile(source);
  const path = relative(dirname(resolve(opts.out)), resolve(source)).split(sep).join('/');
  return { model: loaded.model, from: source, ref: opts.inline ? loaded.model : { file: path } };
}

function runFreeze(source: string, opts: Options, io: Io): void {
  const tolerance = {
    absolute: {
      force: nonNegative(opts.toleranceForce, '--tolerance-force', DEFAULT_TOLERANCE.absolute.force),
      displacement: nonNegative(opts.toleranceDisplacement, '--tolerance-displacement', DEFAULT_TOLERANCE.absolute.displacement),
    },
    relative: nonNegative(opts.toleranceRel, '--tolerance-rel', DEFAULT_TOLERANCE.relative),
  };
  const frozen = fromSource(source, opts);
  const check = toStructure(frozen.model);
  if (!check.structure) throw new InputError(source, check.issues);
  const st = check.structure;
  const doc = analysisJson(st, analyze(st), check.units);
  const wanted = opts.loadings.flatMap((l) => l.split(',')).map((l) => l.trim()).filter(Boolean);
  const have = Object.keys(doc.results);
  for (const id of wanted) {
    if (!have.includes(id)) throw new UsageError(`--loadings ${id}: ${have.length ? `the model has ${have.join(', ')}` : `the model has no results (${doc.classification.status})`}`);
  }
  if (frozen.line) crossCheck(frozen.line, doc, io);
  const c = frozenCase({
    schema: String(ReferenceCase.$id),
    name: opts.name ?? frozen.model.name,
    description: `Frozen by panelpoint freeze ${VERSION} from ${frozen.from}. Figures in the model units (${check.units.length}, ${check.units.force}).`,
    source: sourceOf(opts, frozen.from),
    model: frozen.ref,
    doc,
    ...(wanted.length ? { loadings: wanted } : {}),
    tolerance,
  });
  writeFileAtomic(opts.out, JSON.stringify(c, null, 2) + '\n');
  const n = Object.values(c.expected.results ?? {}).reduce((s, r) => s + figures(r), 0);
  io.out(`froze ${source} → ${opts.out}: ${doc.classification.status}, ${Object.keys(c.expected.results ?? {}).length} loading(s), ${n} figures\n`);
}

function figures(r: NonNullable<ReferenceCase['expected']['results']>[string]): number {
  const pairs = (o: Record<string, object> | undefined) => Object.values(o ?? {}).reduce((s, v) => s + Object.keys(v).length, 0);
  return Object.keys(r.memberForces ?? {}).length + pairs(r.reactions) + pairs(r.displacements);
}

/** The rebuilt variant should give what the sweep recorded; say so when it does not. */
function crossCheck(line: VariantLine, doc: ReturnType<typeof analysisJson>, io: Io): void {
  const c = doc.classification;
  if (line.status !== c.status || line.k !== c.mechanisms || line.s !== c.selfStress)
    io.err(`warning: the sweep recorded ${line.status} (k = ${line.k}, s = ${line.s}) for variant ${line.index}; the rebuilt model is ${c.status} (k = ${c.mechanisms}, s = ${c.selfStress})\n`);
  const forces = Object.values(doc.results).flatMap((r) => Object.values((r as { memberForces: Record<string, number> }).memberForces));
  const peaks: [string, number | undefined, number][] = [
    ['peak tension', line.peakTension?.value, Math.max(0, ...forces)],
    ['peak compression', line.peakCompression?.value, Math.min(0, ...forces)],
  ];
  for (const [what, recorded, now] of peaks) {
    if (typeof recorded === 'number' && Math.abs(recorded - now) > 2e-6 + 1e-9 * Math.abs(now))
      io.err(`warning: the sweep recorded ${what} ${recorded} kN for variant ${line.index}; the rebuilt model gives ${now} kN\n`);
  }
}
