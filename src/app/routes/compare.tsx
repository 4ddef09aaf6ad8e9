/** /projects/:slug/runs/:runId/compare?v=1,5,9 — two to four variants at one scale, with their differences. */
import { useMemo } from 'react';
import { useParams, useSearchParams } from 'react-router-dom';
import { useComparedVariants } from '@/features/compare/api/get-compared';
import { CompareView } from '@/features/compare/components/compare-view';
import { useRun } from '@/features/runs/api/get-runs';
import { TrussDrawing } from '@/features/truss-drawing/components/TrussDrawing';
import { commonScale } from '@/features/truss-drawing/lib/common-scale';
import { PageHeader } from '@/components/panel';
import { PageLoading } from '@/components/page-loading';
import { ErrorPanel } from '@/components/error-panel';
import { CautionLine } from '@/components/caution-line';
import type { VariantDetailDto } from '@/lib/run-types';
import { fmt } from '@/lib/format';
import { variantPath } from '@/lib/paths';
import { useProjectPage } from '../use-project-page';
import { Crumbs } from './crumbs';

export function ComparePage() {
  const { slug, project } = useProjectPage();
  const { runId = '' } = useParams();
  const [params] = useSearchParams();
  const indices = useMemo(() => [...new Set((params.get('v') ?? '').split(',').filter((s) => /^\d+$/.test(s)).map(Number))].slice(0, 4), [params]);
  const runRef = useMemo(() => ({ slug, runId }), [slug, runId]);
  const run = useRun(runRef);
  const qs = useComparedVariants(runRef, indices);
  const items = qs.every((q) => q.data) ? qs.map((q) => q.data as VariantDetailDto) : undefined;
  const drawn = useMemo(() => items?.filter((i) => i.model && i.analysis) ?? [], [items]);
  const scale = useMemo(() => (drawn.length ? commonScale(drawn.map((i) => ({ model: i.model!, analysis: i.analysis! }))) : undefined), [drawn]);
  const header = <PageHeader context={<Crumbs slug={slug} project={project.data?.name} runId={runId} />} title={`Compare ${indices.length} variants`} />;
  if (indices.length < 2) return <>{header}<p role="alert" className="text-sm text-bad">Pick two to four variants to compare: tick them in the variants table.</p></>;
  const failed = qs.find((q) => q.isError);
  if (failed) return <>{header}<ErrorPanel error={failed.error} what="a variant to compare" onRetry={() => qs.forEach((q) => void q.refetch())} /></>;
  if (!items) return <>{header}<PageLoading what="variants" /></>;
  const unit = drawn[0]?.analysis?.units.length ?? 'm';
  const scaleNote = scale
    ? <>All drawings at one scale: each holds the same {fmt(scale.box[2], 3)} × {fmt(scale.box[3], 3)} {unit} box, so a {unit} is as long in one as in the others. Deflections are each drawn at 5 % of the span.</>
    : 'None of these variants could be built, so there is nothing to draw.';
  return (
    <>
      {header}
      <CompareView items={items} paramNames={run.data?.paramNames ?? Object.keys(items[0].variant.params)} scaleNote={scaleNote}
        variantHref={(i) => variantPath(slug, runId, i)}
        renderDrawing={(it) => (it.model && it.analysis
          ? <TrussDrawing model={it.model} analysis={it.analysis} scale={scale} initialJointLabels={false} />
          : <p className="m-0 rounded border border-rule bg-sheet p-3 text-xs text-ink-2">Not built: {it.variant.reason ?? 'no reason recorded'}.</p>)} />
      <div className="mt-3"><CautionLine /></div>
    </>
  );
}
