import { describe, expect, it } from 'vitest';
import { canGrantRole, globalRightsOf, GLOBAL_RIGHTS, PROJECT_RIGHTS, projectRightsOf, TOKEN_SCOPES } from './rights';

describe('rights', () => {
  it('admin holds every right', () => {
    expect([...projectRightsOf('admin')].sort()).toEqual([...PROJECT_RIGHTS].sort());
    expect([...globalRightsOf('admin')].sort()).toEqual([...GLOBAL_RIGHTS].sort());
  });

  it('engineer pushes runs, freezes cases, marks, comments and reads, but does not administer', () => {
    const e = projectRightsOf('engineer');
    for (const r of ['runs:push', 'cases:freeze', 'variants:mark', 'variants:reject', 'comments:write', 'project:read'] as const) expect(e.has(r)).toBe(true);
    expect(e.has('project:admin')).toBe(false);
    expect(globalRightsOf('engineer').has('users:admin')).toBe(false);
  });

  it('reviewer comments, marks candidates and reads; viewer only reads', () => {
    expect([...projectRightsOf('reviewer')].sort()).toEqual(['comments:write', 'project:read', 'variants:mark']);
    expect([...projectRightsOf('viewer')]).toEqual(['project:read']);
    expect(globalRightsOf('viewer').size).toBe(0);
  });

  it('a role can be handed out only by someone holding all of its rights', () => {
    expect(canGrantRole(projectRightsOf('engineer'), 'reviewer')).toBe(true);
    expect(canGrantRole(projectRightsOf('engineer'), 'admin')).toBe(false);
    expect(canGrantRole(projectRightsOf('reviewer'), 'engineer')).toBe(false);
  });

  it('token scopes are project rights and exclude administration', () => {
    for (const s of TOKEN_SCOPES) expect(PROJECT_RIGHTS).toContain(s);
    expect(TOKEN_SCOPES).not.toContain('project:admin');
    expect(TOKEN_SCOPES).not.toContain('tokens:manage');
  });
});
