/** The texts of the notices sent to a project's engineers: a run pushed, reference checks failing. */
import type { MailMessage } from './mailer';

export interface RunNotice {
  projectName: string;
  studyName: string;
  pushedBy: string;
  variants: number;
  status: string;
  gitCommit: string | null;
  link: string;
}

export function runPushedMail(to: string, n: RunNotice): MailMessage {
  return {
    to,
    subject: `New run in ${n.projectName}: ${n.studyName}`,
    text: [
      `${n.pushedBy} pushed a run of the study "${n.studyName}" to ${n.projectName}.`,
      '',
      `Variants: ${n.variants}`,
      `Status: ${n.status}`,
      `Commit: ${n.gitCommit ?? 'not given'}`,
      '',
      `Open it: ${n.link}`,
      '',
    ].join('\n'),
  };
}

export interface FailedCheck {
  caseName: string;
  file: string;
  status: string;
  details: unknown;
  gitCommit: string | null;
  /** The last passing result before this one, or null when the case never passed on the server. */
  lastPass: { gitCommit: string | null; at: Date } | null;
}

const LABEL: Record<string, string> = { drift: 'DRIFT (figures out of tolerance)', invalid: 'INVALID (the case does not load)', error: 'ERROR (the recomputation failed)' };
const MAX_FIGURES = 10;

interface Figure { figure?: unknown; want?: unknown; got?: unknown; difference?: unknown; allowed?: unknown; note?: unknown }

const show = (v: unknown) => (v === undefined || v === null ? 'missing' : typeof v === 'number' ? String(Number(v.toPrecision(6))) : String(v));

/** The figures (or problems) a check result carries, as indented lines. */
function figureLines(details: unknown): string[] {
  const d = (details && typeof details === 'object' ? details : {}) as { failures?: unknown; problems?: unknown; units?: { length?: string; force?: string } };
  if (Array.isArray(d.failures) && d.failures.length) {
    const lines = (d.failures as Figure[]).slice(0, MAX_FIGURES).map((f) => {
      const amounts = f.difference !== undefined ? ` (difference ${show(f.difference)}, allowed ${show(f.allowed)})` : '';
      return `    ${show(f.figure)}: want ${show(f.want)}, got ${show(f.got)}${amounts}${f.note ? ` — ${String(f.note)}` : ''}`;
    });
    if (d.failures.length > MAX_FIGURES) lines.push(`    ... and ${d.failures.length - MAX_FIGURES} more`);
    if (d.units?.force || d.units?.length) lines.push(`    (forces in ${d.units.force ?? '?'}, lengths in ${d.units.length ?? '?'})`);
    return lines;
  }
  if (typeof d.problems === 'string' && d.problems) return d.problems.split('\n').slice(0, 12).map((l) => `    ${l}`);
  return ['    (no details were sent)'];
}

export function checksFailedMail(to: string, projectName: string, failures: readonly FailedCheck[], pushedBy: string, link: string): MailMessage {
  const first = failures[0];
  const subject = failures.length === 1
    ? `Check failed in ${projectName}: ${first.caseName}`
    : `Checks failed in ${projectName}: ${failures.length} reference cases`;
  const blocks = failures.map((f) => [
    `  ${f.caseName} (${f.file}): ${LABEL[f.status] ?? f.status}`,
    `    commit: ${f.gitCommit ?? 'not given'}; ${f.lastPass ? `last passed ${f.lastPass.at.toISOString()} at commit ${f.lastPass.gitCommit ?? 'not given'}` : 'no passing result recorded before'}`,
    ...figureLines(f.details),
  ].join('\n'));
  return {
    to,
    subject,
    text: [
      `A check pushed by ${pushedBy} found reference case${failures.length === 1 ? '' : 's'} of ${projectName} failing that passed before (or had no result yet):`,
      '',
      blocks.join('\n\n'),
      '',
      "You get this once per case when it starts failing; repeated failures are not mailed again until it passes.",
      `History: ${link}`,
      '',
    ].join('\n'),
  };
}
