import { Type, type Static } from '@sinclair/typebox';
import { Scope } from './common';

export const TokenCreate = Type.Object(
  {
    name: Type.String({ minLength: 1, maxLength: 100, description: 'What the token is for, e.g. "laptop CLI".' }),
    scopes: Type.Optional(Type.Array(Scope, { minItems: 1, uniqueItems: true, description: "Defaults to every scope the creator holds." })),
  },
  { additionalProperties: false, title: 'TokenCreate' },
);
export type TokenCreate = Static<typeof TokenCreate>;
