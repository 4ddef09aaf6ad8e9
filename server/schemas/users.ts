import { Type, type Static } from '@sinclair/typebox';
import { Email, NewPassword, RoleName } from './common';

const Name = Type.String({ minLength: 1, maxLength: 120 });

export const UserCreate = Type.Object(
  {
    email: Email,
    name: Name,
    role: RoleName,
    password: Type.Optional(NewPassword), // generated and returned once when left out
  },
  { additionalProperties: false, title: 'UserCreate' },
);
export type UserCreate = Static<typeof UserCreate>;

export const UserUpdate = Type.Object(
  { name: Type.Optional(Name), role: Type.Optional(RoleName), disabled: Type.Optional(Type.Boolean()), password: Type.Optional(NewPassword) },
  { additionalProperties: false, minProperties: 1, title: 'UserUpdate' },
);
export type UserUpdate = Static<typeof UserUpdate>;
