/**
 * /projects/:slug/runs/:runId — a run's design space (charts) over its variants table; a chart
 * selection filters the table. /…/variants is the table alone. Loaded lazily: the charts pull in Plotly.
 */
import { useMemo, useState } from 'react';
import { Link, useParams } from 'react-router-dom';
import { useRun } from '@/features/runs/api/get-runs';
import { RunFacts } from '@/features/runs/components/run-facts';
import { RunReasons } from '@/features/runs/components/run-reasons';
import { DesignSpace } from '@/features/design-space/components/design-space';
import { VariantsTable } from '@/features/variants/components/variants-table';
import { useVariantTableState } from '@/features/variants/hooks/use-table-state';
import { PageHeader } from '@/components/panel';
import { QueryState } from '@/components/query-state';
import { ErrorBoundary } from '@/components/error-boundary';
import { BTN } from '@/components/ui';
import { runPath } from '@/lib/paths';
import { useProjectPage } from '../use-project-page';
import { Crumbs } from './crumbs';

function RunView({ charts }: { charts: boolean }) {
  const { slug, project, rights, meId } = useProjectPage();
  const { runId = '' } = useParams();
  const runRef = useMemo(() => ({ slug, runId }), [slug, runId]);
  const run = useRun(runRef);
  const table = useVariantTableState();
  const [note, setNote] = useState<string>();
  return (
    <QueryState q={run} what="the run">
      {(r) => (
        <div className="flex flex-col gap-3">
          <PageHeader context={<Crumbs slug={slug} project={project.data?.name} />} title={r.study.name} facts={<RunFacts run={r} />}
            actions={charts ? <Link to={`${runPath(slug, runId)}/variants`} className={BTN}>Table only</Link> : <Link to={runPath(slug, runId)} className={BTN}>Charts and table</Link>} />
          <RunReasons slug={slug} run={r} />
          {charts && (
            <ErrorBoundary what="the design space">
              <DesignSpace run={r} runRef={runRef} onSelection={(s, fields) => setNote(table.select(s, fields).note)} />
            </ErrorBoundary>
          )}
          <VariantsTable run={r} runRef={runRef} rights={rights} meId={meId} table={table} selectionNote={note} />
        </div>
      )}
    </QueryState>
  );
}

export const RunPage = () => <RunView charts />;
export const VariantsPage = () => <RunView charts={false} />;
