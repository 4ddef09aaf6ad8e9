/** The facts line of a run page: study, who pushed it and when, CLI version, commit, counts per status. */
import type { RunDetail } from '@/lib/run-types';
import { STATUSES, STATUS_LABEL } from '@/lib/figures';
import { fmtCount, fmtWhen, shortCommit } from '@/lib/format';

export function RunFacts({ run }: { run: RunDetail }) {
  const critical = run.summary?.critical ?? 0;
  return (
    <>
      <span>{run.study.family}</span>
      <span>pushed {fmtWhen(run.pushedAt)} by {run.pushedBy?.name ?? 'a deleted account'}</span>
      <span className="num">CLI {run.cliVersion} · commit {shortCommit(run.gitCommit)}</span>
      <span className="num">{fmtCount(run.variantCount)} variants: {STATUSES.filter((s) => run.byStatus?.[s]).map((s) => `${fmtCount(run.byStatus![s]!)} ${STATUS_LABEL[s].replace('Stable, ', '').toLowerCase()}`).join(', ')}{critical ? `, ${fmtCount(critical)} critical` : ''}</span>
      {run.status !== 'complete' && <span className="text-warn">{run.status}</span>}
    </>
  );
}
