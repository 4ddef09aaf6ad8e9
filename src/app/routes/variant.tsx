import { fmtPlain } from '@/lib/format';
/** /projects/:slug/runs/:runId/variants/:index — a variant from the team server: the server's check, marks, comments, and the full view. */
import { useMemo } from 'react';
import { Link, useParams } from 'react-router-dom';
import { useVariant } from '@/features/variants/api/get-variant';
import { RecomputeCheck } from '@/features/variants/components/recompute-check';
import { VariantActions } from '@/features/variants/components/variant-actions';
import { VariantDetail } from '@/features/variant-detail/components/VariantDetail';
import { TrussDrawing } from '@/features/truss-drawing/components/TrussDrawing';
import { QueryState } from '@/components/query-state';
import { StatusPill } from '@/components/status-pill';
import { runPath } from '@/lib/paths';
import { useProjectPage } from '../use-project-page';
import { Crumbs } from './crumbs';

export function VariantPage() {
  const { slug, project, rights, meId } = useProjectPage();
  const { runId = '', index = '' } = useParams();
  const runRef = useMemo(() => ({ slug, runId }), [slug, runId]);
  const q = useVariant(runRef, /^\d+$/.test(index) ? Number(index) : -1);
  return (
    <QueryState q={q} what={`variant ${index} of run ${runId}`}>
      {({ variant, model, analysis, check }) => {
        const described = Object.entries(variant.params).map(([k, v]) => `${k}=${fmtPlain(v)}`).join(', ');
        const context = <><Crumbs slug={slug} project={project.data?.name} runId={runId} /> · variant <span className="num">{variant.index}</span> · <span className="num">{variant.variantId}</span> · <span className="num">{described}</span></>;
        const toolbar = (
          <div className="flex flex-wrap items-start gap-3">
            <div className="min-w-0 flex-1"><RecomputeCheck check={check} /></div>
            <VariantActions runRef={runRef} row={variant} rights={rights} meId={meId} />
          </div>
        );
        return (
          <div className="flex flex-col gap-3">
            {model && analysis ? (
              <VariantDetail key={`${runId}/${index}`} model={model} analysis={analysis} context={context} toolbar={toolbar}
                renderDrawing={(slot) => <TrussDrawing model={model} analysis={analysis} {...slot} />} />
            ) : (
              <section className="flex flex-col gap-2 rounded border border-rule bg-sheet p-3 text-sm">
                <div className="text-xs text-ink-3">{context}</div>
                {toolbar}
                <p className="m-0 mt-1"><StatusPill status={variant.status} critical={variant.critical} /> This variant could not be built, so there is no drawing: {variant.reason ?? 'no reason recorded'}.</p>
                <Link to={runPath(slug, runId)} className="text-xs text-tension underline">Back to the run</Link>
              </section>
            )}
          </div>
        );
      }}
    </QueryState>
  );
}
