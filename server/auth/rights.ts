/**
 * Roles and the rights they grant: the one place that says who may do what. Code checks
 * rights (`requireRight('runs:push')`), never role names.
 *
 * Project rights apply inside one project and come from the caller's Membership role there;
 * global rights come from the user's global role. The right `projects:all` (admins) grants
 * every project right in every project, member or not.
 *
 * To add a right: append it to PROJECT_RIGHTS or GLOBAL_RIGHTS, grant it to roles in GRANTS,
 * and add it to TOKEN_SCOPES if an API token (the CLI) may use it.
 */

export const ROLES = ['admin', 'engineer', 'reviewer', 'viewer'] as const;
export type Role = (typeof ROLES)[number];

export const PROJECT_RIGHTS = [
  'project:read', // see the project, its members, runs, variants, comments, cases
  'project:admin', // edit or delete the project, manage members and every token of the project
  'members:invite', // invite people with a role whose rights the inviter holds
  'tokens:manage', // create, list and revoke one's own API tokens for the project
  'runs:push', // push runs and variants (CLI)
  'cases:freeze', // freeze reference cases and record check results
  'variants:mark', // mark variants as candidates
  'variants:reject', // mark variants as rejected
  'comments:write', // comment on variants
  'uploads:write', // upload study, model and DXF files, import DXF drawings, delete one's own uploads
  'checks:push', // record reference-case check results (panelpoint check --push)
] as const;
export type ProjectRight = (typeof PROJECT_RIGHTS)[number];

export const GLOBAL_RIGHTS = [
  'users:admin', // manage user accounts and global roles
  'projects:create', // create projects (the creator becomes their admin)
  'projects:all', // every project right in every project
  'mail:read', // read mail captured by the development mailer
] as const;
export type GlobalRight = (typeof GLOBAL_RIGHTS)[number];

export type Right = ProjectRight | GlobalRight;

const ALL: readonly Right[] = [...PROJECT_RIGHTS, ...GLOBAL_RIGHTS];

const GRANTS: Record<Role, readonly Right[]> = {
  admin: ALL,
  engineer: [
    'project:read', 'members:invite', 'tokens:manage', 'runs:push', 'cases:freeze',
    'variants:mark', 'variants:reject', 'comments:write', 'projects:create', 'uploads:write', 'checks:push',
  ],
  reviewer: ['project:read', 'variants:mark', 'comments:write'],
  viewer: ['project:read'],
};

/** Rights an API token may carry (a subset of its creator's rights in the project). */
export const TOKEN_SCOPES: readonly ProjectRight[] = [
  'project:read', 'runs:push', 'cases:freeze', 'variants:mark', 'variants:reject', 'comments:write',
  'uploads:write', 'checks:push',
];

const PROJECT_SET = new Set<string>(PROJECT_RIGHTS);

export function isProjectRight(right: Right): right is ProjectRight {
  return PROJECT_SET.has(right);
}

/** The global rights of a global role. */
export function globalRightsOf(role: Role): Set<GlobalRight> {
  return new Set(GRANTS[role].filter((r): r is GlobalRight => !isProjectRight(r)));
}

/** The project rights of a role held in a project. */
export function projectRightsOf(role: Role): Set<ProjectRight> {
  return new Set(GRANTS[role].filter(isProjectRight));
}

/** All project rights (what `projects:all` grants). */
export function allProjectRights(): Set<ProjectRight> {
  return new Set(PROJECT_RIGHTS);
}

/** True when every project right of `role` is in `held`: who holds `held` may hand out `role`. */
export function canGrantRole(held: ReadonlySet<ProjectRight>, role: Role): boolean {
  return [...projectRightsOf(role)].every((r) => held.has(r));
}
