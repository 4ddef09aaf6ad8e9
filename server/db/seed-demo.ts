/**
 * Demo data for a first start: four accounts (admin, engineer, reviewer, viewer) with generated
 * passwords, returned so the caller can print them once, and two invented projects. Does
 * nothing when any account exists already (passwords are never reset).
 */
import type { Sequelize } from 'sequelize';
import { generatePassword } from '../auth/passwords';
import type { Role } from '../auth/rights';
import { createAccount } from '../services/users.service';
import { initModels } from './init-models';
import { Membership } from './models/membership.model';
import { Project } from './models/project.model';
import { User } from './models/user.model';

export interface DemoAccount {
  email: string;
  name: string;
  role: Role;
  /** Shown once; only its bcrypt hash is stored. */
  password: string;
}

export interface DemoSeed {
  created: boolean;
  accounts: DemoAccount[];
  projects: string[];
}

const ACCOUNTS: Omit<DemoAccount, 'password'>[] = [
  { email: 'admin@panelpoint.example', name: 'Ada Admin', role: 'admin' },
  { email: 'engineer@panelpoint.example', name: 'Ellis Engineer', role: 'engineer' },
  { email: 'reviewer@panelpoint.example', name: 'Rowan Reviewer', role: 'reviewer' },
  { email: 'viewer@panelpoint.example', name: 'Vic Viewer', role: 'viewer' },
];

const PROJECTS = [
  {
    slug: 'harrow-lane-depot', name: 'Harrow Lane depot roof',
    description: 'A fictional bus depot: pitched roof trusses spanning 24 m at 6 m centres, steel hollow sections.',
  },
  {
    slug: 'kestrel-brook-footbridge', name: 'Kestrel Brook footbridge',
    description: 'A fictional footbridge: two parallel-chord trusses spanning 18 m over a brook.',
  },
];

export async function seedDemo(sequelize: Sequelize, options: { bcryptRounds?: number } = {}): Promise<DemoSeed> {
  initModels(sequelize);
  if ((await User.count()) > 0) return { created: false, accounts: [], projects: [] };
  const accounts = ACCOUNTS.map((a) => ({ ...a, password: generatePassword() }));
  await sequelize.transaction(async (transaction) => {
    const users = [];
    for (const a of accounts) users.push(await createAccount(a, options.bcryptRounds ?? 10, transaction));
    for (const p of PROJECTS) {
      const project = await Project.create(p, { transaction });
      // Each demo account's project role is its global role.
      for (const u of users) await Membership.create({ userId: u.id, projectId: project.id, role: u.role }, { transaction });
    }
  });
  return { created: true, accounts, projects: PROJECTS.map((p) => p.slug) };
}
