import { Type, type Static } from '@sinclair/typebox';
import { Email, RoleName, Slug } from './common';

const Name = Type.String({ minLength: 1, maxLength: 120 });
const Description = Type.String({ maxLength: 5000 });

export const ProjectCreate = Type.Object(
  { slug: Slug, name: Name, description: Type.Optional(Description) },
  { additionalProperties: false, title: 'ProjectCreate' },
);
export type ProjectCreate = Static<typeof ProjectCreate>;

export const ProjectUpdate = Type.Object(
  { name: Type.Optional(Name), description: Type.Optional(Description) },
  { additionalProperties: false, minProperties: 1, title: 'ProjectUpdate' },
);
export type ProjectUpdate = Static<typeof ProjectUpdate>;

export const MemberAdd = Type.Object({ email: Email, role: RoleName }, { additionalProperties: false, title: 'MemberAdd' });
export type MemberAdd = Static<typeof MemberAdd>;

export const MemberUpdate = Type.Object({ role: RoleName }, { additionalProperties: false, title: 'MemberUpdate' });
export type MemberUpdate = Static<typeof MemberUpdate>;
