// `panelpoint check [PATHS...]`: recompute every reference case and compare it with what it
// expects. Exit 0 when all pass, 3 when any drifted or failed to recompute, 2 when a path is
// missing or a case is invalid (every case is reported first). With --push --project P the
// outcome also goes to the team server (after it is printed); a failed push exits 1.
import type { Command } from 'commander';
import { performance } from 'node:perf_hooks';
import { analyze } from '../../shared/engine/analyze';
import { analysisJson } from '../../shared/report/analysis-json';
import { allowanceFor, compareCase } from '../../shared/reference/compare';
import { junitXml, type JunitCase, type JunitSuite } from '../../shared/reference/junit';
import { writeFileAtomic } from '../io/write-atomic';
import { findCaseFiles } from '../reference/find-cases';
import { loadCase } from '../reference/load-case';
import { checkReport, driftText, problemText, type CaseOutcome } from '../reference/check-text';
import { CredentialsError } from '../reference/credentials';
import { PushError } from '../reference/push-http';
import { pushCheckOutcomes, pushSummaryText } from '../reference/push-checks';
import { ExitCode, UsageError, VERSION, type Io } from '../context';

interface Options { junit?: string; json?: boolean; push?: boolean; project?: string }

/** Where `panelpoint check` looks when given no paths. */
export const DEFAULT_REFERENCE_DIR = 'examples/reference';

export function registerCheck(program: Command, io: Io): void {
  program
    .command('check')
    .description('Recompute reference cases and compare them with their expected classification and figures (for CI).')
    .argument('[paths...]', `case files or folders searched for them (default: ${DEFAULT_REFERENCE_DIR})`)
    .option('--junit <file>', 'also write a JUnit XML report (whole or not at all)')
    .option('--json', 'print the outcome as JSON instead of the table')
    .option('--push', 'also send the outcome to the team server (needs --project; server and token from panelpoint login or PANELPOINT_SERVER/PANELPOINT_TOKEN)')
    .option('--project <slug>', 'the project on the team server that --push records the results in')
    .addHelpText('after', '\nExit codes: 0 all pass, 3 a case drifted or failed to recompute, 2 a path is missing or a case is invalid, 1 the push failed.\n\nExamples:\n  panelpoint check\n  panelpoint check examples/reference tests/reference --junit out/reference.xml\n  panelpoint check --push --project harrow-lane-depot\n')
    .action((paths: string[], opts: Options) => runCheck(paths, opts, io));
}

function checkOne(file: string, suite: string): CaseOutcome {
  const t0 = performance.now();
  const seconds = () => (performance.now() - t0) / 1000;
  const loaded = loadCase(file);
  if (!loaded.ok) return { file, suite, name: loaded.name ?? file, status: 'invalid', problems: loaded.problems, seconds: seconds() };
  const { structure: st, units } = loaded.model;
  const base = { file, suite, name: loaded.case.name, units: { length: units.length, force: units.force } };
  try {
    const doc = analysisJson(st, analyze(st), units);
    const comparison = compareCase(loaded.case.expected, doc, allowanceFor(loaded.case.tolerance, units));
    return { ...base, status: comparison.ok ? 'pass' : 'drift', comparison, seconds: seconds() };
  } catch (e) {
    return { ...base, status: 'error', problems: e instanceof Error ? (e.stack ?? e.message) : String(e), seconds: seconds() };
  }
}

function junitSuites(outcomes: readonly CaseOutcome[], missing: readonly string[]): JunitSuite[] {
  const suites = new Map<string, JunitCase[]>();
  for (const o of outcomes) {
    const c: JunitCase = { name: o.name, classname: o.suite, file: o.file, time: o.seconds };
    if (o.status === 'drift') {
      const n = o.comparison!.failures.length;
      c.failure = { message: `${n} figure${n === 1 ? '' : 's'} out of tolerance; worst ${o.comparison!.worst?.figure ?? ''}\n${driftText(o)}`, text: driftText(o) };
    } else if (o.status === 'invalid' || o.status === 'error') {
      c.error = { message: o.status === 'invalid' ? 'invalid reference case' : 'recomputation failed', text: problemText(o) };
    }
    if (!suites.has(o.suite)) suites.set(o.suite, []);
    suites.get(o.suite)!.push(c);
  }
  const out = [...suites].map(([name, cases]) => ({ name, cases }));
  if (missing.length) out.push({ name: 'missing paths', cases: missing.map((p) => ({ name: p, classname: 'missing paths', error: { message: 'path not found', text: `${p}: path not found` } })) });
  return out;
}

/** Push after printing; a failure is reported here and becomes exit 1 once the check has spoken. */
async function push(outcomes: readonly CaseOutcome[], project: string, io: Io): Promise<boolean> {
  try {
    io.err(pushSummaryText(await pushCheckOutcomes(outcomes, project), project));
    return true;
  } catch (e) {
    if (!(e instanceof PushError || e instanceof CredentialsError)) throw e;
    io.err(`panelpoint check --push: ${e.message}\n`);
    return false;
  }
}

async function runCheck(paths: string[], opts: Options, io: Io): Promise<void> {
  if (opts.push && !opts.project) throw new UsageError('--push needs --project <slug>: the project to record the results in');
  if (opts.project && !opts.push) throw new UsageError('--project is for --push');
  const found = findCaseFiles(paths.length ? paths : [DEFAULT_REFERENCE_DIR]);
  const outcomes = found.files.map((f) => checkOne(f.path, f.suite));
  if (opts.junit) writeFileAtomic(opts.junit, junitXml(junitSuites(outcomes, found.missing)));
  if (opts.json) {
    const count = (s: CaseOutcome['status']) => outcomes.filter((o) => o.status === s).length;
    const doc = {
      panelpoint: VERSION,
      cases: outcomes.map(({ seconds: _s, ...o }) => o),
      missing: found.missing,
      summary: { cases: outcomes.length, passed: count('pass'), drifted: count('drift'), invalid: count('invalid'), failed: count('error') },
    };
    io.out(JSON.stringify(doc, null, 2) + '\n');
  } else {
    io.out(checkReport(outcomes, found.missing));
  }
  const pushed = opts.push && outcomes.length ? await push(outcomes, opts.project!, io) : true;
  if (!pushed) throw new ExitCode(1, '');
  const bad = outcomes.filter((o) => o.status === 'invalid').length;
  if (found.missing.length || bad) throw new ExitCode(2, `panelpoint check: ${found.missing.length ? `${found.missing.length} path(s) not found` : ''}${found.missing.length && bad ? ', ' : ''}${bad ? `${bad} invalid reference case(s)` : ''}`);
  if (!outcomes.length) throw new ExitCode(2, `panelpoint check: no reference cases found in ${(paths.length ? paths : [DEFAULT_REFERENCE_DIR]).join(', ')}`);
  const drifted = outcomes.filter((o) => o.status === 'drift' || o.status === 'error').length;
  if (drifted) throw new ExitCode(3, `panelpoint check: ${drifted} reference case(s) drifted or failed to recompute`);
}
