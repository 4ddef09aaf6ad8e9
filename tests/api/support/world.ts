/**
 * A cast for rights tests, each with a session token:
 *   admin     global admin, member of no project (sees every project through `projects:all`)
 *   engineer  global engineer, engineer in `project`
 *   reviewer  global reviewer, reviewer in `project`
 *   viewer    global viewer, viewer in `project`
 *   outsider  global engineer, engineer in `other` only: `project` must look absent to them
 *   promoted  global viewer, engineer in `project`: the project role decides inside the project
 */
import type { Role } from '../../../server/auth/rights';
import type { Project } from '../../../server/db/models/project.model';
import { addMember, api, makeProject, makeUser, sessionToken, type Client, type TestApp, type TestUser } from './test-app';

export const ACTORS = ['anonymous', 'admin', 'engineer', 'reviewer', 'viewer', 'outsider', 'promoted'] as const;
export type Actor = (typeof ACTORS)[number];
export type Person = Exclude<Actor, 'anonymous'>;

export interface World {
  project: Project;
  other: Project;
  people: Record<Person, TestUser>;
  tokens: Record<Person, string>;
  /** A client that calls the API as `actor`. */
  as(actor: Actor): Client;
}

const CAST: Record<Person, { global: Role; inProject?: Role; inOther?: Role }> = {
  admin: { global: 'admin' },
  engineer: { global: 'engineer', inProject: 'engineer' },
  reviewer: { global: 'reviewer', inProject: 'reviewer' },
  viewer: { global: 'viewer', inProject: 'viewer' },
  outsider: { global: 'engineer', inOther: 'engineer' },
  promoted: { global: 'viewer', inProject: 'engineer' },
};

export async function buildWorld(t: TestApp): Promise<World> {
  const project = await makeProject(undefined, 'Alpha roof');
  const other = await makeProject(undefined, 'Beta bridge');
  const people = {} as Record<Person, TestUser>;
  const tokens = {} as Record<Person, string>;
  for (const [name, c] of Object.entries(CAST) as [Person, (typeof CAST)[Person]][]) {
    people[name] = await makeUser(c.global, { name });
    if (c.inProject) await addMember(people[name].user, project, c.inProject);
    if (c.inOther) await addMember(people[name].user, other, c.inOther);
    tokens[name] = sessionToken(people[name].user, t.config);
  }
  return { project, other, people, tokens, as: (actor) => api(t.app, actor === 'anonymous' ? undefined : tokens[actor]) };
}
