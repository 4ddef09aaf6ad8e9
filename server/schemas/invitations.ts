import { Type, type Static } from '@sinclair/typebox';
import { Email, NewPassword, OneTimeToken, RoleName } from './common';

export const InvitationCreate = Type.Object({ email: Email, role: RoleName }, { additionalProperties: false, title: 'InvitationCreate' });
export type InvitationCreate = Static<typeof InvitationCreate>;

/** `name` and `password` are needed only when no account has the invited email yet. */
export const InvitationAccept = Type.Object(
  { token: OneTimeToken, name: Type.Optional(Type.String({ minLength: 1, maxLength: 120 })), password: Type.Optional(NewPassword) },
  { additionalProperties: false, title: 'InvitationAccept' },
);
export type InvitationAccept = Static<typeof InvitationAccept>;
