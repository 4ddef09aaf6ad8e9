// `panelpoint analyze FILE`: classify one model and, when it stands, analyse every loading.
import type { Command } from 'commander';
import { analyze } from '../../shared/engine/analyze';
import { cutSection, type SectionResult } from '../../shared/engine/sections';
import { analysisJson } from '../../shared/report/analysis-json';
import { loadModelFile, readJsonFile } from '../io/read-json';
import { writeFileAtomic } from '../io/write-atomic';
import { analysisText } from '../report/analysis-text';
import { ExitCode, UsageError, VERSION, type Io } from '../context';
import { InputError } from '../../shared/errors';
import { prepareDesign } from '../../shared/design/prepare';
import { sizeStructure } from '../../shared/design/size-structure';
import { designJson, designText } from '../report/design-text';

interface Options { design?: string; cases?: boolean; json?: boolean; combination?: string[]; section?: string[]; failOn?: string; out?: string }

export function registerAnalyze(program: Command, io: Io): void {
  program
    .command('analyze')
    .description('Classify a truss (stable? determinate? where is it weak?) and compute member forces, reactions and displacements.')
    .argument('<file>', 'model file (JSON)')
    .option('--json', 'print the result as JSON (the contract CI jobs read)')
    .option('-c, --combination <ids>', 'report only these combinations or load cases (comma-separated; repeatable)', collect, [])
    .option('-s, --section <members>', 'method of sections: cut these members (comma-separated, up to three); repeat for more cuts', collect, [])
    .option('-d, --design <file>', 'size the members from a catalogue (design spec JSON: code, material, catalogue, groups, lengths); members are grouped by their "group"')
    .option('--cases', 'also tabulate each load case alone (the JSON always has them under "cases")')
    .option('--fail-on <what>', "exit 1 when the frame is 'unstable' (or 'critical')")
    .option('-o, --out <file>', 'also write the JSON result to this file (written whole or not at all)')
    .addHelpText('after', '\nExamples:\n  panelpoint analyze examples/models/depot-roof-r3.json\n  panelpoint analyze bridge.json --json --section TC4,D4,BC4\n')
    .action((file: string, opts: Options) => runAnalyze(file, opts, io));
}

const collect = (value: string, previous: string[]) => [...previous, value];

function runAnalyze(file: string, opts: Options, io: Io): void {
  if (opts.failOn && !['unstable', 'critical'].includes(opts.failOn)) throw new UsageError(`--fail-on takes 'unstable' or 'critical', not '${opts.failOn}'`);
  const loaded = loadModelFile(file);
  const { units } = loaded;
  let st = loaded.structure;
  let sizing: ReturnType<typeof sizeStructure> | undefined;
  if (opts.design) {
    const doc = readJsonFile(opts.design);
    const prepared = prepareDesign(doc.data);
    if (!prepared.design) throw new InputError(opts.design, prepared.issues.map((i) => ({ ...i, ...doc.locate(i.path) })));
    sizing = sizeStructure(st, prepared.design);
    if (sizing.structure) st = sizing.structure;
    for (const w of prepared.warnings) io.err(`note: ${opts.design} ${w.path}: ${w.message}\n`);
  }
  const an = analyze(st);
  const loadingIds = an.loadings.ids;
  const wanted = (opts.combination ?? []).flatMap((c) => c.split(',')).filter(Boolean);
  const caseIds = an.caseResults.map((r) => r.id);
  for (const id of wanted) if (!loadingIds.includes(id) && !caseIds.includes(id)) throw new UsageError(`--combination ${id}: the model has ${an.loadings.kind === 'combination' ? 'combinations' : 'load cases'} ${loadingIds.join(', ')}`);
  const cuts: { loading: string; result: SectionResult }[] = [];
  if ((opts.section ?? []).length && !an.results.length) {
    const why = an.classification.status === 'unstable' ? 'the frame is unstable, so it has no member forces to cut' : 'the model has no loads';
    io.err(`note: --section ignored: ${why}\n`);
  }
  for (const spec of opts.section ?? []) {
    const names = spec.split(',').map((s) => s.trim()).filter(Boolean);
    const idx = names.map((n) => {
      const e = st.memberIds.indexOf(n);
      if (e < 0) throw new UsageError(`--section: no member '${n}' in ${file}`);
      return e;
    });
    for (const r of an.results) {
      if (wanted.length && !wanted.includes(r.id)) continue;
      const c = loadingIds.indexOf(r.id);
      const loads = an.loadings.loads.subarray(c * 2 * st.nodeIds.length, (c + 1) * 2 * st.nodeIds.length);
      cuts.push({ loading: r.id, result: cutSection(st, idx, loads, r.react) });
    }
  }
  const doc = { ...analysisJson(st, an, units, cuts), ...(sizing ? { design: designJson(sizing, units) } : {}) };
  if (wanted.length) {
    for (const id of Object.keys(doc.results)) if (!wanted.includes(id)) delete doc.results[id];
    for (const id of Object.keys(doc.cases)) if (!wanted.includes(id)) delete doc.cases[id];
  }
  const json = JSON.stringify({ panelpoint: VERSION, file, ...doc }, null, 2) + '\n';
  if (opts.out) writeFileAtomic(opts.out, json);
  io.out(opts.json ? json : analysisText(doc, file, VERSION, wanted, opts.cases) + (sizing ? designText(sizing) : ''));
  const c = an.classification;
  if (opts.failOn === 'unstable' && c.status === 'unstable') throw new ExitCode(1, `${file}: unstable (k = ${c.mechanisms}); --fail-on unstable`);
  if (opts.failOn === 'critical' && c.critical) throw new ExitCode(1, `${file}: critical form; --fail-on critical`);
}
