import { Type, type Static } from '@sinclair/typebox';

export const MarkSet = Type.Object(
  {
    kind: Type.Union([Type.Literal('candidate'), Type.Literal('rejected')], {
      description: 'candidate (needs variants:mark) or rejected (needs variants:reject).',
    }),
  },
  { additionalProperties: false, title: 'MarkSet' },
);
export type MarkSet = Static<typeof MarkSet>;
