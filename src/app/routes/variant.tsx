/** A variant of a run, from the team server. */
import { Link, useParams } from 'react-router-dom';
import { useVariant } from '@/features/variants/api/get-variant';
import { VariantDetail } from '@/features/variant-detail/components/VariantDetail';
import { TrussDrawing } from '@/features/truss-drawing/components/TrussDrawing';
import { PageLoading } from '@/components/page-loading';
import { ErrorPanel } from '@/components/error-panel';

export function VariantPage() {
  const { projectId = '', runId = '', variantId = '' } = useParams();
  const q = useVariant(runId, variantId);
  if (q.isPending) return <PageLoading what="variant" />;
  if (q.isError) return <ErrorPanel error={q.error} what={`variant ${variantId} of run ${runId}`} onRetry={() => q.refetch()} />;
  const { model, analysis, params } = q.data;
  const described = Object.entries(params).map(([k, v]) => `${k}=${v}`).join(', ');
  return (
    <VariantDetail
      key={`${runId}/${variantId}`}
      model={model}
      analysis={analysis}
      context={<><Link to={`/projects/${projectId}/runs/${runId}/variants`} className="underline">Run {runId}</Link> · variant <span className="num">{variantId}</span> · <span className="num">{described}</span></>}
      renderDrawing={(slot) => <TrussDrawing model={model} analysis={analysis} {...slot} />}
    />
  );
}
