import { getRun, getRuns, postRun } from '../controllers/runs.controller';
import { ApiRouter } from '../http/api-router';
import { authenticate } from '../middleware/authenticate';
import { requireRight } from '../middleware/require-right';
import { compilePushValidators } from '../services/runs-push-header';

const PUSH = 'Body: application/x-ndjson, streamed (no size limit): a line {"kind":"run",manifest,summary,study:{name,family,hash,body},cliVersion,gitCommit}, '
  + 'then lines {"kind":"variants","rows":[...]} of up to 2,000 variants.jsonl records. One transaction: any error stores nothing. '
  + 'The run key is manifest.runId, or "<study hash>/<shard count>" for shards, which merge into one run. '
  + '201 for a new run; 200 when a shard joins or extends it; 200 {unchanged:true} when nothing is new.';

export function runsRoutes(): ApiRouter {
  compilePushValidators();
  return new ApiRouter('runs')
    .post('/projects/:slug/runs', { summary: 'Push a run, or one shard of it (panelpoint push)', description: PUSH, status: 201 },
      authenticate, requireRight('runs:push'), postRun)
    .get('/projects/:slug/runs', { summary: 'Runs of the project, newest first', description: 'Query: study=ID for the runs of one study.' },
      authenticate, requireRight('project:read'), getRuns)
    .get('/projects/:slug/runs/:runId', { summary: 'One run: shards, summary, parameters, p-columns, combinations', description: 'A shard run key holds a slash: encode it (%2F).' },
      authenticate, requireRight('project:read'), getRun);
}
