/** Fields shared by the request-body schemas. */
import { Type } from '@sinclair/typebox';
import { ROLES, TOKEN_SCOPES } from '../auth/rights';

export const Email = Type.String({ pattern: '^[^\\s@]+@[^\\s@]+\\.[^\\s@]+$', maxLength: 254, description: 'An email address.' });

/** bcrypt reads at most 72 bytes, hence the upper limit. */
export const NewPassword = Type.String({ minLength: 10, maxLength: 72, description: 'At least 10 characters.' });

export const RoleName = Type.Union(ROLES.map((r) => Type.Literal(r)), { description: 'admin, engineer, reviewer or viewer.' });

export const Slug = Type.String({
  pattern: '^[a-z0-9]+(-[a-z0-9]+)*$', minLength: 2, maxLength: 64,
  description: 'Lower-case letters, digits and single hyphens, e.g. harrow-lane-depot.',
});

export const Scope = Type.Union(TOKEN_SCOPES.map((s) => Type.Literal(s)), { description: 'A right the token carries.' });

/** A one-time token from a mailed link. */
export const OneTimeToken = Type.String({ minLength: 20, maxLength: 200 });
