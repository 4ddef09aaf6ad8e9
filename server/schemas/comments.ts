import { Type, type Static } from '@sinclair/typebox';

export const CommentCreate = Type.Object(
  { body: Type.String({ minLength: 1, maxLength: 10_000, pattern: '\\S', description: 'The comment, plain text (up to 10,000 characters).' }) },
  { additionalProperties: false, title: 'CommentCreate' },
);
export type CommentCreate = Static<typeof CommentCreate>;
