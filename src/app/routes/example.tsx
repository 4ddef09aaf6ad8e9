/** /examples/:name — a shipped model analysed in the browser, shown as a variant. */
import { useParams, Link } from 'react-router-dom';
import { useExample } from '@/features/examples/api/get-example';
import { VariantDetail } from '@/features/variant-detail/components/VariantDetail';
import { TrussDrawing } from '@/features/truss-drawing/components/TrussDrawing';
import { PageLoading } from '@/components/page-loading';
import { ErrorPanel } from '@/components/error-panel';

export function ExamplePage() {
  const { name = '' } = useParams();
  const q = useExample(name);
  if (q.isPending) return <PageLoading what="example" />;
  if (q.isError) return <ErrorPanel error={q.error} what={`the example ${name}`} />;
  const { model, analysis } = q.data;
  return (
    <VariantDetail
      key={name}
      model={model}
      analysis={analysis}
      context={<><Link to="/examples" className="underline">Examples</Link> · <span className="num">examples/models/{name}.json</span> · analysed in this browser</>}
      renderDrawing={(slot) => <TrussDrawing model={model} analysis={analysis} {...slot} />}
    />
  );
}
