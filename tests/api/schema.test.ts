/** The migrations build what the models describe; the variant indexes exist; down and up again works. */
import { UniqueConstraintError, type Model, type ModelStatic } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { MODELS } from '../../server/db/init-models';
import { createMigrator } from '../../server/db/migrator';
import { Run } from '../../server/db/models/run.model';
import { Study } from '../../server/db/models/study.model';
import { Variant } from '../../server/db/models/variant.model';
import { makeProject, makeUser, startTestApp, type TestApp } from './support/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(() => t.close());

interface IndexRow {
  Key_name: string;
  Column_name: string;
  Seq_in_index: number;
  Non_unique: number;
}

async function indexes(table: string): Promise<Map<string, { columns: string[]; unique: boolean }>> {
  const [rows] = (await t.sequelize.query(`SHOW INDEX FROM \`${table}\``)) as [IndexRow[], unknown];
  const out = new Map<string, { columns: string[]; unique: boolean }>();
  for (const r of [...rows].sort((a, b) => a.Seq_in_index - b.Seq_in_index)) {
    const entry = out.get(r.Key_name) ?? { columns: [], unique: Number(r.Non_unique) === 0 };
    entry.columns.push(r.Column_name);
    out.set(r.Key_name, entry);
  }
  return out;
}

describe('schema', () => {
  it('every model matches its table: same columns, same nullability', async () => {
    const qi = t.sequelize.getQueryInterface();
    for (const model of MODELS as readonly ModelStatic<Model>[]) {
      const table = model.getTableName() as string;
      const columns = await qi.describeTable(table);
      const attributes = Object.values(model.getAttributes());
      expect([table, Object.keys(columns).sort()]).toEqual([table, attributes.map((a) => a.field!).sort()]);
      for (const a of attributes) {
        expect([table, a.field, columns[a.field!].allowNull]).toEqual([table, a.field, a.allowNull !== false && !a.primaryKey]);
      }
    }
  });

  it('variants have the composite unique (run, index) and an index with runPk for each indexed sort and chart column', async () => {
    const list = [...(await indexes('variants')).values()];
    expect(list).toContainEqual({ columns: ['runPk', 'index'], unique: true });
    for (const c of ['peakCompression', 'peakTension', 'maxDisplacement', 'spanOverDeflection', 'weight', 'maxUtilisation', 'p1', 'p2', 'p3', 'p4']) {
      expect(list).toContainEqual({ columns: ['runPk', c], unique: false });
    }
  });

  it('variants carry no index that migration 006 dropped (each one costs every pushed row an insert)', async () => {
    const list = [...(await indexes('variants')).values()].map((i) => i.columns.join(','));
    for (const c of ['variantId', 'status', 'p5', 'p6', 'k', 's']) expect(list).not.toContain(`runPk,${c}`);
    // PRIMARY, the unique (runPk, index) and the ten above: nothing else is maintained per row.
    expect(list).toHaveLength(12);
  });

  it('unique keys hold where the issue asks', async () => {
    const uniques = async (table: string) => [...(await indexes(table)).values()].filter((i) => i.unique).map((i) => i.columns.join(','));
    expect(await uniques('users')).toContain('email');
    expect(await uniques('projects')).toContain('slug');
    expect(await uniques('runs')).toContain('runId');
    expect(await uniques('memberships')).toContain('userId,projectId');
    expect(await uniques('api_tokens')).toContain('prefix');
  });

  it('stores JSON columns and gives them back as values; a duplicate (run, index) is refused', async () => {
    const project = await makeProject();
    const { user } = await makeUser('engineer');
    const study = await Study.create({ projectId: project.id, name: 'roof', family: 'pratt', hash: 'a'.repeat(64), body: { vary: { span: [18, 24] } }, createdBy: user.id });
    const run = await Run.create({
      runId: '3f0c7f4e-1d2b-4c5a-9e8f-0a1b2c3d4e5f', projectId: project.id, studyId: study.id, pushedBy: user.id, cliVersion: '0.1.0',
      gitCommit: null, shards: [{ index: 1, count: 1 }], status: 'complete', summary: { variants: 1 }, paramColumns: { span: 'p1' },
    });
    const fields = {
      runPk: run.id, index: 0, variantId: '0123456789abcdef', params: { span: 24, shape: 'pratt' }, status: 'determinate' as const,
      joints: 12, members: 21, reactions: 3, k: 0, s: 0, critical: false, peakTension: 120.5, peakTensionMember: 'b3',
      peakCompression: -130.25, peakCompressionMember: 't3', maxDisplacement: 0.012, spanOverDeflection: 2000, weight: null,
      maxUtilisation: null, reason: null, p1: 24, p2: null, p3: null, p4: null, p5: null, p6: null,
    };
    await Variant.create(fields);
    const back = await Variant.findOne({ where: { runPk: run.id, index: 0 } });
    expect(back!.params).toEqual({ span: 24, shape: 'pratt' });
    expect((await Run.findByPk(run.id))!.paramColumns).toEqual({ span: 'p1' });
    expect((await Study.findByPk(study.id))!.body).toEqual({ vary: { span: [18, 24] } });
    await expect(Variant.create(fields)).rejects.toBeInstanceOf(UniqueConstraintError);
  });

  it('migrates all the way down and up again', async () => {
    const migrator = createMigrator(t.sequelize);
    const names = (await migrator.executed()).map((m) => m.name);
    expect(names).toEqual(['001-accounts', '002-studies-runs', '003-review-files', '004-captured-mail', '005-run-queries', '006-lean-variant-indexes']);
    await migrator.down({ to: '006-lean-variant-indexes' });
    const restored = [...(await indexes('variants')).values()].map((i) => i.columns.join(','));
    for (const c of ['variantId', 'status', 'p5', 'p6']) expect(restored).toContain(`runPk,${c}`);
    await migrator.down({ to: 0 });
    const tables = (await t.sequelize.getQueryInterface().showAllTables()) as unknown as ({ tableName: string } | string)[];
    expect(tables.map((x) => (typeof x === 'string' ? x : x.tableName))).toEqual(['schema_migrations']);
    await migrator.up();
    expect((await migrator.executed()).map((m) => m.name)).toEqual(names);
  });
});
