/** The verdict: status, the counts behind it (j, m, r, Maxwell's count, rank, k, s) and the loading's peaks. */
import type { AnalysisJson } from '@shared/report/analysis-json';
import type { ReactNode } from 'react';
import { fmt, fmtSigned, fmtSmallLength } from '@/lib/format';

type Classification = AnalysisJson['classification'];
interface Peak { tension: { member: string; force: number } | null; compression: { member: string; force: number } | null; maxDisplacement: { node: string; value: number } }
interface Checks { equilibriumResidual: number; staticsDifference?: number }

function headline(c: Classification): { text: string; tone: string } {
  if (c.status === 'unstable') return { text: `Unstable: ${c.mechanisms} mechanism${c.mechanisms === 1 ? '' : 's'}`, tone: 'bg-bad text-white' };
  if (c.status === 'indeterminate') return { text: `Stable, indeterminate to degree ${c.degree}`, tone: 'bg-ok text-white' };
  return { text: 'Stable, statically determinate', tone: 'bg-ok text-white' };
}

function Row({ term, children, hint }: { term: string; children: ReactNode; hint?: string }) {
  return (
    <>
      <dt className="text-ink-2" title={hint}>{term}</dt>
      <dd className="num m-0 text-right text-ink">{children}</dd>
    </>
  );
}

export function VerdictPanel({ analysis, loading }: { analysis: AnalysisJson; loading?: string }) {
  const c = analysis.classification;
  const h = headline(c);
  const r = loading ? ((analysis.results[loading] ?? analysis.cases[loading]) as { peak: Peak; checks: Checks } | undefined) : undefined;
  const { force, length } = analysis.units;
  return (
    <section aria-labelledby="verdict-h" className="rounded border border-rule bg-sheet">
      <h2 id="verdict-h" className="border-b border-rule px-3 py-1.5 text-xs font-semibold uppercase tracking-wide text-ink-2">Verdict</h2>
      <div className="px-3 py-2">
        <p data-testid="verdict-status" className={`inline-block rounded px-2 py-0.5 text-sm font-semibold ${h.tone}`}>{h.text}</p>
        {c.critical && <p className="mt-1 text-xs text-bad">The count balances, yet the geometry leaves a mechanism.</p>}
        {c.nearlyMechanism && <p className="mt-1 text-xs text-warn">Nearly a mechanism (conditioning {c.conditioning.toExponential(2)}).</p>}
        <dl className="mt-2 grid grid-cols-[1fr_auto] gap-x-4 gap-y-0.5 text-xs">
          <Row term="Joints j">{c.joints}</Row>
          <Row term="Members m">{c.members}</Row>
          <Row term="Reaction components r">{c.reactions}</Row>
          <Row term="Maxwell's count m + r − 2j" hint="m + r − 2j = s − k">{fmtSigned(c.countRule)}</Row>
          <Row term="Rank of equilibrium matrix">{c.rank}</Row>
          <Row term="Mechanisms k">{c.mechanisms}</Row>
          <Row term="Self-stress states s">{c.selfStress}</Row>
          <Row term="Conditioning" hint="smallest / largest nonzero singular value">{fmt(c.conditioning, 3)}</Row>
        </dl>
        {r && (
          <dl className="mt-2 grid grid-cols-[1fr_auto] gap-x-4 gap-y-0.5 border-t border-rule pt-2 text-xs">
            <Row term={`Peak tension (${force})`}>{r.peak.tension ? `${fmtSigned(r.peak.tension.force)} ${r.peak.tension.member}` : '—'}</Row>
            <Row term={`Peak compression (${force})`}>{r.peak.compression ? `${fmt(r.peak.compression.force)} ${r.peak.compression.member}` : '—'}</Row>
            <Row term="Largest displacement">{`${fmtSmallLength(r.peak.maxDisplacement.value, length)} ${r.peak.maxDisplacement.node}`}</Row>
            <Row term={`Equilibrium residual (${force})`}>{r.checks.equilibriumResidual.toExponential(1)}</Row>
            {r.checks.staticsDifference !== undefined && <Row term={`Statics vs stiffness (${force})`}>{r.checks.staticsDifference.toExponential(1)}</Row>}
          </dl>
        )}
      </div>
    </section>
  );
}
