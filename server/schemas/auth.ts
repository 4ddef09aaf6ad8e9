import { Type, type Static } from '@sinclair/typebox';
import { Email, NewPassword, OneTimeToken } from './common';

export const SignIn = Type.Object(
  { email: Email, password: Type.String({ minLength: 1, maxLength: 200 }) },
  { additionalProperties: false, title: 'SignIn' },
);
export type SignIn = Static<typeof SignIn>;

export const PasswordResetRequest = Type.Object({ email: Email }, { additionalProperties: false, title: 'PasswordResetRequest' });
export type PasswordResetRequest = Static<typeof PasswordResetRequest>;

export const PasswordResetConfirm = Type.Object(
  { token: OneTimeToken, password: NewPassword },
  { additionalProperties: false, title: 'PasswordResetConfirm' },
);
export type PasswordResetConfirm = Static<typeof PasswordResetConfirm>;
