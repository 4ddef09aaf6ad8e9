// `panelpoint sweep STUDY`: expand a study into variants and evaluate them on all cores.
import type { Command } from 'commander';
import { basename, extname, join } from 'node:path';
import { randomUUID } from 'node:crypto';
import { InputError } from '../../shared/errors';
import { parseShard, shardRange } from '../../shared/sweep/shard';
import { csvHeader } from '../../shared/sweep/record-format';
import { emptySummary, type Objective } from '../../shared/sweep/summary';
import type { Study } from '../../shared/schemas/study';
import { ExitCode, UsageError, VERSION, type Io } from '../context';
import { loadStudyFile, type LoadedStudy as LoadedStudyType } from '../sweep/load-study';
import { passes, variantAt } from '../../shared/sweep/space';
import { freshRunDir, readManifest, ResultWriter, scanForResume, writeManifest, writeSummary, type RunManifest } from '../sweep/run-dir';
import { startProgress } from '../sweep/progress';
import { defaultBatch, defaultWorkers, driveSweep } from '../sweep/run-sweep';
import { sweepSummaryText } from '../report/sweep-summary-text';

interface Options { out?: string; workers?: string; shard?: string; resume?: boolean; maxVariants: string; batch?: string; json?: boolean; quiet?: boolean }

export function registerSweep(program: Command, io: Io): void {
  program
    .command('sweep')
    .description('Evaluate every variant of a study on worker threads; write variants.jsonl, variants.csv and summary.json.')
    .argument('<study>', 'study file (JSON)')
    .option('-o, --out <dir>', 'output folder (default: out/<study name>)')
    .option('-w, --workers <n>', 'worker threads (default: all cores)')
    .option('--shard <i/n>', 'run only slice i of n (1-based), for batch schedulers; join with `panelpoint merge`')
    .option('--resume', 'continue an interrupted run in --out, doing only what is missing')
    .option('--max-variants <n>', 'refuse a space larger than this', '5000000')
    .option('--batch <n>', 'variants per message to a worker (default: automatic)')
    .option('--json', 'print summary.json to stdout instead of the table')
    .option('-q, --quiet', 'no progress on stderr')
    .addHelpText('after', '\nExamples:\n  panelpoint sweep examples/studies/depot-roof-pratt.json --out out/depot\n  panelpoint sweep big.json --shard 3/8 --out out/big-3\n')
    .action((file: string, opts: Options) => runSweepCommand(file, opts, io));
}

/** Does any variant of [start, end) pass the study's filters? Cheap: no truss is built. */
function anyPasses(setup: LoadedStudyType['setup'], start: number, end: number): boolean {
  const p = {};
  for (let i = start; i < end; i++) if (passes(setup.plan, variantAt(setup.plan, i, p))) return true;
  return false;
}

const positiveInt = (text: string | undefined, flag: string, fallback: number): number => {
  if (text === undefined) return fallback;
  const n = Number(text);
  if (!Number.isInteger(n) || n < 1) throw new UsageError(`${flag} takes a whole number ≥ 1, not '${text}'`);
  return n;
};

async function runSweepCommand(file: string, opts: Options, io: Io): Promise<void> {
  const workers = positiveInt(opts.workers, '--workers', defaultWorkers());
  const maxVariants = positiveInt(opts.maxVariants, '--max-variants', 5_000_000);
  const shard = opts.shard ? parseShard(opts.shard) : { index: 1, count: 1 };
  if ('issues' in shard) throw new UsageError(`--shard: ${shard.issues.map((i) => i.message).join('; ')}`);
  const loaded = loadStudyFile(file);
  const { setup } = loaded;
  const study = loaded.data as Study;
  const size = setup.plan.size;
  if (size === 0) throw new InputError(file, [{ path: 'vary', code: 'space-empty', message: 'the parameter space is empty (0 variants)' }]);
  if (size > maxVariants) throw new InputError(file, [{ path: 'vary', code: 'space-too-large', message: `the space has ${size.toLocaleString('en-US')} variants, over --max-variants ${maxVariants.toLocaleString('en-US')}` }]);
  const { start, end } = shardRange(size, shard.index, shard.count);
  if (setup.plan.filters.length && !anyPasses(setup, start, end)) {
    throw new InputError(file, [{ path: 'where', code: 'space-empty', message: `every one of the ${(end - start).toLocaleString('en-US')} variants${shard.count > 1 ? ' of this shard' : ''} is left out by the filters` }]);
  }
  const out = opts.out ?? join('out', basename(file, extname(file)));
  const objective: Objective = study.objective
    ? 'minimize' in study.objective ? { figure: study.objective.minimize, sense: 'minimize' } : { figure: study.objective.maximize, sense: 'maximize' }
    : { figure: 'maxAbsForce', sense: 'minimize' };
  const paramNames = [...setup.plan.paramNames];

  let manifest: RunManifest;
  let summary = emptySummary(objective);
  let from = start;
  if (opts.resume && readManifest(out)) {
    const old = readManifest(out)!;
    if (old.status === 'complete' || 'mergedFrom' in old) {
      throw new InputError(out, [{ path: 'run.json', code: 'run-complete', message: `holds a ${'mergedFrom' in old ? 'merged' : 'complete'} run; there is nothing to resume (choose another --out for a new run)` }]);
    }
    if (old.study.hash !== loaded.hash) throw new InputError(out, [{ path: 'run.json', code: 'run-other-study', message: `holds a run of another study (or of an edited one): hash ${old.study.hash}, this study ${loaded.hash}` }]);
    if (old.shard.index !== shard.index || old.shard.count !== shard.count) throw new InputError(out, [{ path: 'run.json', code: 'run-other-shard', message: `holds shard ${old.shard.index}/${old.shard.count}, not ${shard.index}/${shard.count}` }]);
    const scan = scanForResume(out, objective);
    from = Math.max(scan.lastIndex + 1, Math.min(old.nextIndex, end), start);
    summary = scan.summary;
    summary.filtered = from - start - scan.lines;
    manifest = { ...old, status: 'running', nextIndex: from };
    if (!opts.quiet) io.err(`resuming ${out}: ${scan.lines.toLocaleString('en-US')} variants on disk, ${(end - from).toLocaleString('en-US')} to go\n`);
  } else {
    freshRunDir(out, csvHeader(paramNames, setup.design !== undefined));
    manifest = {
      panelpoint: VERSION, runId: randomUUID(),
      study: { name: study.name, family: study.family, hash: loaded.hash, file },
      shard: { index: shard.index, count: shard.count }, range: { start, end }, spaceSize: size, paramNames,
      combinations: loaded.combinations, units: { force: 'kN', length: 'm' }, objective,
      status: 'running', startedAt: new Date().toISOString(), nextIndex: start,
    };
  }
  writeManifest(out, manifest);

  let stop = false;
  const abort = () => process.exit(130);
  const onSigint = () => {
    stop = true;
    io.err('\nstopping: finishing the batches under way (Ctrl-C again to abort)\n');
    process.once('SIGINT', abort);
  };
  process.once('SIGINT', onSigint);
  const writer = new ResultWriter(out);
  const progress = startProgress(io, end - from, `sweep ${study.name}`, opts.quiet);
  const tStart = performance.now();
  let t0 = tStart;
  let lastSave = t0;
  let next = from;
  try {
    next = await driveSweep({
      task: { study: loaded.data, studyHash: loaded.hash, objective },
      start: from, end, workers, batch: positiveInt(opts.batch, '--batch', defaultBatch(end - from, workers)),
      writer, summary, progress, stopping: () => stop,
      onReady() { t0 = performance.now(); },
      onFlush(n) {
        const now = performance.now();
        if (now - lastSave > 2000) {
          lastSave = now;
          writeManifest(out, { ...manifest, nextIndex: n });
        }
      },
    });
  } finally {
    progress.stop();
    writer.close();
    process.removeListener('SIGINT', onSigint);
    process.removeListener('SIGINT', abort);
  }
  const seconds = (performance.now() - t0) / 1000;
  const startupSeconds = (t0 - tStart) / 1000;
  const interrupted = next < end;
  manifest = { ...manifest, status: interrupted ? 'interrupted' : 'complete', finishedAt: new Date().toISOString(), nextIndex: next };
  const doc = { panelpoint: VERSION, runId: manifest.runId, study: manifest.study, shard: manifest.shard, range: manifest.range, status: manifest.status, units: manifest.units, workers, seconds: Number(seconds.toFixed(3)), startupSeconds: Number(startupSeconds.toFixed(3)), ...summary };
  writeSummary(out, doc);
  writeManifest(out, manifest);
  io.out(opts.json ? JSON.stringify(doc, null, 2) + '\n' : sweepSummaryText(summary, { study: study.name, out, seconds, startupSeconds, workers, interrupted, paramNames }));
  if (interrupted) throw new ExitCode(130, `interrupted: variants up to index ${next - 1} are on disk; run again with --resume to finish`);
  if (summary.byStatus.error > 0) throw new ExitCode(3, `${summary.byStatus.error} variant(s) failed; see 'reason' in ${out}/variants.jsonl`);
}
