/** /projects/:slug/studies/:studyId — the study file as pushed, and its runs. */
import { useParams } from 'react-router-dom';
import { useRuns, useStudy } from '@/features/runs/api/get-runs';
import { RunsTable } from '@/features/runs/components/runs-table';
import { PageHeader, Panel } from '@/components/panel';
import { QueryState } from '@/components/query-state';
import { fmtWhen } from '@/lib/format';
import { useProjectPage } from '../use-project-page';
import { Crumbs } from './crumbs';

export function StudyPage() {
  const { slug, project } = useProjectPage();
  const { studyId = '' } = useParams();
  const study = useStudy(slug, studyId);
  const runs = useRuns(slug, studyId);
  return (
    <QueryState q={study} what="the study">
      {(s) => (
        <div className="flex flex-col gap-3">
          <PageHeader context={<Crumbs slug={slug} project={project.data?.name} />} title={s.name}
            facts={<><span className="num">{s.family}</span><span className="num">hash {s.hash.slice(0, 16)}</span><span>first pushed {fmtWhen(s.createdAt)}</span></>} />
          <Panel title="Runs" count={runs.data?.length}>
            <QueryState q={runs} what="the runs">{(list) => <RunsTable slug={slug} runs={list} caption={`Runs of ${s.name}`} />}</QueryState>
          </Panel>
          <Panel title="Study file">
            <pre className="num m-0 max-h-[32rem] overflow-auto p-3 text-[12px]">{JSON.stringify(s.body, null, 2)}</pre>
          </Panel>
        </div>
      )}
    </QueryState>
  );
}
