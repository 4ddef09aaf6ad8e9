// `panelpoint check --push --project P`: send what the check found to the team server. Cases the
// server does not have yet are registered first (their model or study file read in, since the
// server cannot read files beside a case); then one batch of results goes to /checks.
import { execFileSync } from 'node:child_process';
import { dirname, relative, resolve, sep } from 'node:path';
import type { FigureCheck } from '../../shared/reference/compare';
import { readJsonFile } from '../io/read-json';
import type { CaseOutcome } from './check-text';
import { readCredentials } from './credentials';
import { PushError, requestJson, type RetryOptions } from './push-http';

/** What a push did, for the closing line. */
export interface PushSummary {
  server: string;
  pushed: number;
  registered: string[];
  /** Cases not pushed, with why. */
  skipped: { name: string; why: string }[];
  newlyFailing: string[];
  notified: number;
}

/** The commit checked: CI's variable, else `git rev-parse HEAD`, else null. */
export function currentCommit(env: NodeJS.ProcessEnv = process.env): string | null {
  const ci = env.GITHUB_SHA || env.CI_COMMIT_SHA || env.GIT_COMMIT;
  if (ci) return ci.slice(0, 64);
  try {
    return execFileSync('git', ['rev-parse', 'HEAD'], { encoding: 'utf8', stdio: ['ignore', 'pipe', 'ignore'], timeout: 5000 }).trim() || null;
  } catch {
    return null;
  }
}

const figure = (f: FigureCheck) => ({
  figure: f.figure, kind: f.kind, want: f.want, ...(f.got !== undefined ? { got: f.got } : {}),
  ...(f.difference !== undefined ? { difference: f.difference } : {}), ...(f.allowed !== undefined ? { allowed: f.allowed } : {}),
  ...(f.note ? { note: f.note } : {}),
});

/** What the server keeps of one outcome: the figures out of tolerance, or the problems. */
export function outcomeDetails(o: CaseOutcome): Record<string, unknown> {
  if (o.comparison) {
    const c = o.comparison;
    return { compared: c.compared, failures: c.failures.slice(0, 50).map(figure), ...(c.worst ? { worst: figure(c.worst) } : {}), ...(o.units ? { units: o.units } : {}) };
  }
  return { problems: (o.problems ?? '').slice(0, 4000) };
}

/** A case file as the server keeps it: a `{ file }` model or a study path read in. */
export function selfContainedCase(file: string): Record<string, unknown> {
  const body = structuredClone(readJsonFile(file).data) as Record<string, unknown>;
  const model = body.model as Record<string, unknown> | undefined;
  if (model && typeof model.file === 'string') body.model = readJsonFile(resolve(dirname(file), model.file)).data;
  else if (model && typeof model.study === 'string') body.model = { ...model, study: readJsonFile(resolve(dirname(file), model.study)).data };
  delete body.$schema;
  return body;
}

const posix = (p: string) => relative(process.cwd(), p).split(sep).join('/') || p;

async function register(creds: ReturnType<typeof readCredentials>, base: string, o: CaseOutcome, retry: RetryOptions): Promise<string | undefined> {
  let body: Record<string, unknown>;
  try {
    body = selfContainedCase(o.file);
  } catch (e) {
    return `its files do not load (${e instanceof Error ? e.message.split('\n')[0] : String(e)})`;
  }
  try {
    await requestJson(creds, 'POST', `${base}/cases`, body, `registering the case "${o.name}"`, { ...retry, accept: [409] });
    return undefined;
  } catch (e) {
    if (e instanceof PushError) return e.message;
    throw e;
  }
}

/** Push the outcomes to `project`; throws PushError (or CredentialsError) when the push fails. */
export async function pushCheckOutcomes(outcomes: readonly CaseOutcome[], project: string, retry: RetryOptions = {}): Promise<PushSummary> {
  const creds = readCredentials();
  const base = `/projects/${encodeURIComponent(project)}`;
  const listed = await requestJson(creds, 'GET', `${base}/cases`, undefined, `reading the cases of project ${project}`, retry);
  const known = new Set(((listed.body as { cases?: { name: string }[] }).cases ?? []).map((c) => c.name));
  const summary: PushSummary = { server: creds.server, pushed: 0, registered: [], skipped: [], newlyFailing: [], notified: 0 };
  for (const o of outcomes) {
    if (known.has(o.name)) continue;
    if (o.status === 'invalid') {
      summary.skipped.push({ name: o.name, why: 'the case is invalid and the server does not have it' });
      continue;
    }
    const why = await register(creds, base, o, retry);
    if (why) summary.skipped.push({ name: o.name, why });
    else {
      known.add(o.name);
      summary.registered.push(o.name);
    }
  }
  const commit = currentCommit();
  const batch = outcomes.filter((o) => known.has(o.name)).map((o) => ({ caseName: o.name, file: posix(o.file), status: o.status, details: outcomeDetails(o), gitCommit: commit }));
  if (!batch.length) return summary;
  const res = await requestJson(creds, 'POST', `${base}/checks`, batch, `pushing ${batch.length} check result(s)`, retry);
  const answer = res.body as { recorded?: number; newlyFailing?: string[]; notified?: string[] };
  return { ...summary, pushed: answer.recorded ?? batch.length, newlyFailing: answer.newlyFailing ?? [], notified: answer.notified?.length ?? 0 };
}

/** The closing line(s) on stderr. */
export function pushSummaryText(s: PushSummary, project: string): string {
  const lines = [`pushed ${s.pushed} check result(s) to ${project} on ${s.server}`
    + (s.registered.length ? `; registered ${s.registered.length} new case(s)` : '')
    + (s.newlyFailing.length ? `; newly failing: ${s.newlyFailing.join(', ')} (${s.notified} engineer(s) mailed)` : '')];
  for (const k of s.skipped) lines.push(`not pushed: ${k.name}: ${k.why}`);
  return lines.join('\n') + '\n';
}
