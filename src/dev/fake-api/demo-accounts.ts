/** Accounts, projects and rights of the fake demo (the same invented people as server/db/seed-demo.ts). */
import type { ProjectRight, PublicProject, PublicUser, Role } from '@/lib/api-types';

/** Every demo account signs in with this password (fake mode only). */
export const DEMO_PASSWORD = 'demo-password';

const at = (d: string) => new Date(d).toISOString();

export const USERS: PublicUser[] = [
  { id: 1, email: 'admin@panelpoint.example', name: 'Ada Admin', role: 'admin', disabled: false, createdAt: at('2025-01-06T09:00:00Z') },
  { id: 2, email: 'engineer@panelpoint.example', name: 'Ellis Engineer', role: 'engineer', disabled: false, createdAt: at('2025-01-06T09:05:00Z') },
  { id: 3, email: 'reviewer@panelpoint.example', name: 'Rowan Reviewer', role: 'reviewer', disabled: false, createdAt: at('2025-01-07T10:00:00Z') },
  { id: 4, email: 'viewer@panelpoint.example', name: 'Vic Viewer', role: 'viewer', disabled: false, createdAt: at('2025-01-08T11:30:00Z') },
  { id: 5, email: 'former@panelpoint.example', name: 'Fen Former', role: 'engineer', disabled: true, createdAt: at('2025-01-09T08:15:00Z') },
];

export const PROJECTS: Omit<PublicProject, 'role'>[] = [
  { slug: 'harrow-lane-depot', name: 'Harrow Lane depot roof', createdAt: at('2025-01-06T09:10:00Z'),
    description: 'A fictional bus depot: roof trusses spanning 18 to 30 m at 6 m centres, steel hollow sections.' },
  { slug: 'kestrel-brook-footbridge', name: 'Kestrel Brook footbridge', createdAt: at('2025-01-20T14:00:00Z'),
    description: 'A fictional footbridge: two parallel-chord trusses spanning 18 m over a brook.' },
];

/** As server/auth/rights.ts grants them (copied for the fake: the web never decides rights). */
export const GRANTS: Record<Role, ProjectRight[]> = {
  admin: ['project:read', 'project:admin', 'members:invite', 'tokens:manage', 'runs:push', 'cases:freeze', 'variants:mark', 'variants:reject', 'comments:write', 'uploads:write', 'checks:push'],
  engineer: ['project:read', 'members:invite', 'tokens:manage', 'runs:push', 'cases:freeze', 'variants:mark', 'variants:reject', 'comments:write', 'uploads:write', 'checks:push'],
  reviewer: ['project:read', 'variants:mark', 'comments:write'],
  viewer: ['project:read'],
};
