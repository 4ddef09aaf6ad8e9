/**
 * A push: the NDJSON body read line by line as it arrives, the variants of each line inserted as
 * one batch (runs-insert.ts), all inside one transaction: any failure rolls everything back. A line
 * in the CLI's layout is read from its bytes straight into insert values (runs-push-fast.ts); any
 * other goes through JSON.parse and the record schema (runs-push-rows.ts), which also word the errors.
 * Pushing a shard the run already holds changes nothing; a resumed shard adds only the variants that follow what is
 * stored; a new shard of the same study and shard count joins the same run.
 */
import type { Readable } from 'node:stream';
import { UniqueConstraintError, type Transaction } from 'sequelize';
import { Run } from '../db/models/run.model';
import type { User } from '../db/models/user.model';
import type { ProjectAccess } from '../http/context';
import { conflict, HttpError } from '../http/http-error';
import { audit } from './audit.service';
import { checkHeader, type PushHeader } from './runs-push-header';
import { rowValues, variantInserter } from './runs-insert';
import { fastLineReader, type LineValues } from './runs-push-fast';
import { paramColumnsFor, rowsOfLine, type RowContext } from './runs-push-rows';
import { mergedSummary, publicShards, runStatus, shardEntry, shardsOf, withShard, type PublicShard } from './runs-shards';
import { ndjsonLines, parseLine, type NdjsonLine } from './runs-ndjson';
import { findOrCreateStudy } from './studies.service';

/** Variant batches sent to the database before the oldest has answered. */
const IN_FLIGHT = 2;

export interface PushAnswer {
  runId: string;
  created: boolean;
  unchanged: boolean;
  /** Variants stored by this push. */
  inserted: number;
  variantCount: number;
  status: string;
  shards: PublicShard[];
}

/** Read and store one push; `status` is the HTTP status to answer with (201 for a new run). */
export async function pushRun(body: Readable, access: ProjectAccess, user: User): Promise<{ status: number; answer: PushAnswer }> {
  const lines = ndjsonLines(body.iterator({ destroyOnReturn: false }));
  try {
    const first = await lines.next();
    if (first.done) throw new HttpError(400, 'empty-push', 'The push is empty: send the run line, then the variants lines.');
    const header = checkHeader(parseLine(first.value));
    const sequelize = Run.sequelize!;
    return await sequelize.transaction((transaction) => store(header, lines, access, user, transaction));
  } finally {
    // Stop reading (closing the line reader lets go of the body), but let the rest of the body
    // drain, so that the client, still uploading, gets the answer.
    await lines.return(undefined);
    if (!body.readableEnded) body.resume();
  }
}

async function findOrCreateRun(header: PushHeader, studyId: number, access: ProjectAccess, user: User, t: Transaction): Promise<{ run: Run; created: boolean }> {
  const { manifest, cliVersion, gitCommit } = header.line;
  const find = () => Run.findOne({ where: { runId: header.key }, transaction: t, lock: t.LOCK.UPDATE });
  let run = await find();
  let created = false;
  if (!run) {
    try {
      run = await Run.create({
        runId: header.key, projectId: access.project.id, studyId, pushedBy: user.id, cliVersion, gitCommit, shards: [], status: 'receiving',
        summary: null, variantCount: 0, paramColumns: paramColumnsFor(manifest.paramNames, header.numeric),
      }, { transaction: t });
      created = true;
    } catch (e) {
      if (!(e instanceof UniqueConstraintError)) throw e;
      run = await find(); // another push of a shard of this run committed meanwhile
      if (!run) throw e;
    }
  }
  if (run.projectId !== access.project.id) throw conflict('run-in-other-project', `Run ${header.key} was pushed to another project.`);
  if (run.studyId !== studyId) throw conflict('run-other-study', `Run ${header.key} belongs to another study.`);
  return { run, created };
}

async function store(header: PushHeader, lines: AsyncGenerator<NdjsonLine>, access: ProjectAccess, user: User, t: Transaction) {
  const { manifest, summary, study } = header.line;
  const row = await findOrCreateStudy(access.project.id, study, user, t);
  const { run, created } = await findOrCreateRun(header, row.id, access, user, t);
  const before = shardsOf(run.shards).find((s) => s.index === manifest.shard.index);
  const answer = (inserted: number, unchanged: boolean): PushAnswer => ({
    runId: run.runId, created, unchanged, inserted, variantCount: run.variantCount, status: run.status, shards: publicShards(run.shards),
  });
  if (before?.status === 'complete') {
    for await (const _line of lines); // the shard is stored whole: read the rest unparsed
    return { status: 200, answer: answer(0, true) };
  }

  const ctx: RowContext = { runPk: run.id, paramColumns: run.paramColumns, range: manifest.range, lastIndex: -1 };
  const keepAfter = before?.lastIndex ?? -1;
  const fast = fastLineReader(manifest.paramNames, run.paramColumns);
  const valuesOf = (line: NdjsonLine): LineValues => {
    const quick = fast?.(line.bytes, ctx, keepAfter);
    if (quick) return quick;
    const { rows, records } = rowsOfLine(parseLine(line), line.n, ctx, keepAfter);
    return { values: rows.map(rowValues), records };
  };
  let received = 0;
  let inserted = 0;
  // Inserts in flight: one executing, the next already sent (the connector pipelines commands on
  // the transaction's connection), so the database never waits for this process to read, check
  // and encode a line. A failure of either surfaces below and rolls the whole push back.
  const pending: Promise<unknown>[] = [];
  const insert = variantInserter(t);
  try {
    for await (const line of lines) {
      const { values, records } = valuesOf(line);
      received += records;
      if (!values.length) continue;
      if (pending.length >= IN_FLIGHT) await pending.shift();
      inserted += values.length;
      const p = insert(values);
      p.catch(() => undefined); // handled: awaited above or below, never left to crash the process
      pending.push(p);
    }
  } finally {
    await Promise.allSettled(pending);
  }
  for (const p of pending) await p;
  if (received !== summary.evaluated) {
    throw new HttpError(422, 'push-incomplete', `The push holds ${received} variants, but its summary counts ${summary.evaluated}; nothing was stored.`,
      [{ path: 'summary.evaluated', message: `is ${summary.evaluated}; variants received: ${received}` }]);
  }
  const unchanged = !created && before !== undefined && inserted === 0 && before.status === manifest.status && before.variants === received;
  if (unchanged) return { status: 200, answer: answer(0, true) };

  const entry = shardEntry(manifest, summary, received, Math.max(ctx.lastIndex, keepAfter));
  const shards = withShard(shardsOf(run.shards), entry);
  await run.update({
    shards, summary: mergedSummary(shards), status: runStatus(shards), variantCount: run.variantCount + inserted,
    cliVersion: header.line.cliVersion, gitCommit: header.line.gitCommit,
  }, { transaction: t });
  await audit({
    userId: user.id, projectId: access.project.id, action: 'run.push', entity: 'run', entityId: run.runId,
    details: { shard: `${manifest.shard.index}/${manifest.shard.count}`, inserted, created },
  }, t);
  return { status: created ? 201 : 200, answer: answer(inserted, false) };
}
