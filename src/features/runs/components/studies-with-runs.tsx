/** A project's studies, each with its runs (one request for all runs, grouped by study). */
import { Link } from 'react-router-dom';
import { useRuns, useStudies } from '../api/get-runs';
import { RunsTable } from './runs-table';
import { Panel } from '@/components/panel';
import { QueryState } from '@/components/query-state';
import { fmtWhen } from '@/lib/format';
import { LINK } from '@/components/ui';

export function StudiesWithRuns({ slug }: { slug: string }) {
  const studies = useStudies(slug);
  const runs = useRuns(slug);
  return (
    <QueryState q={studies} what="the studies">
      {(list) => list.length === 0 ? (
        <p className="text-sm text-ink-2">No studies yet: a study arrives with its first run from the CLI.</p>
      ) : (
        <div className="flex flex-col gap-3">
          {list.map((s) => (
            <Panel key={s.id} plain title={s.name} count={s.runCount}
              actions={<>
                <span className="num text-ink-3">{s.family} · {s.hash.slice(0, 10)} · {fmtWhen(s.createdAt)}</span>
                <Link to={`/projects/${slug}/studies/${s.id}`} className={LINK}>Study file</Link>
              </>}>
              <QueryState q={runs} what="the runs">
                {(all) => <RunsTable slug={slug} caption={`Runs of ${s.name}`} runs={all.filter((r) => String(r.study.id) === String(s.id))} />}
              </QueryState>
            </Panel>
          ))}
        </div>
      )}
    </QueryState>
  );
}
