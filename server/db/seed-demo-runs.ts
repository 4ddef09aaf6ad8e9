/**
 * More demo data for a first start, after seed-demo.ts made the accounts and projects: the
 * reference cases of examples/reference, each made self-contained (a `{ file }` model read and
 * put inline) and kept in the demo project it belongs to. The runs feature may add a demo sweep
 * here. Does nothing unless seedDemo created the accounts just now.
 */
import { readdirSync, readFileSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import type { Sequelize } from 'sequelize';
import { looksLikeCase } from '../../shared/reference/validate-case';
import { checkCaseBody } from '../services/cases-check';
import { initModels } from './init-models';
import { Project } from './models/project.model';
import { ReferenceCase } from './models/reference-case.model';
import { User } from './models/user.model';
import type { DemoSeed } from './seed-demo';

export interface DemoRunsSeed {
  /** Reference cases kept, by project slug. */
  cases: Record<string, string[]>;
}

/** Which demo project a case file belongs to; the hand-worked cases go to the depot roof. */
const projectFor = (file: string) => (file.startsWith('kestrel-brook') ? 'kestrel-brook-footbridge' : 'harrow-lane-depot');

const readJson = (path: string): unknown => JSON.parse(readFileSync(path, 'utf8').replace(/^\uFEFF/, ''));

/** A case with its model file read in, as the server keeps cases. */
export function inlineCase(path: string): Record<string, unknown> {
  const body = readJson(path) as Record<string, unknown>;
  const model = body.model as Record<string, unknown> | undefined;
  if (model && typeof model.file === 'string') body.model = readJson(resolve(dirname(path), model.file));
  if (model && typeof model.study === 'string') body.model = { ...model, study: readJson(resolve(dirname(path), model.study)) };
  delete body.$schema;
  return body;
}

export async function seedDemoRuns(sequelize: Sequelize, seed: DemoSeed, options: { examplesDir: string }): Promise<DemoRunsSeed> {
  initModels(sequelize);
  const out: DemoRunsSeed = { cases: {} };
  if (!seed.created) return out;
  const engineer = await User.findOne({ where: { email: 'engineer@panelpoint.example' } });
  const dir = join(options.examplesDir, 'reference');
  const files = readdirSync(dir).filter((f) => f.endsWith('.json') && !f.endsWith('.model.json')).sort();
  for (const file of files) {
    const body = inlineCase(join(dir, file));
    if (!looksLikeCase(body)) continue;
    const checked = checkCaseBody(body);
    const project = await Project.findOne({ where: { slug: projectFor(file) } });
    if (!project) continue;
    await ReferenceCase.create({ projectId: project.id, name: checked.name, body, frozenBy: engineer?.id ?? null });
    (out.cases[project.slug] ??= []).push(checked.name);
  }
  return out;
}
