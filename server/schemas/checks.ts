import { Type, type Static } from '@sinclair/typebox';

/** Outcomes of `panelpoint check`: pass, drift (figures out of tolerance), invalid (the case does not load), error (recomputation failed). */
export const CHECK_OUTCOMES = ['pass', 'drift', 'invalid', 'error'] as const;
export type CheckOutcome = (typeof CHECK_OUTCOMES)[number];

export const CheckResultPush = Type.Object(
  {
    caseName: Type.String({ minLength: 1, maxLength: 200, description: 'Name of a reference case of the project.' }),
    file: Type.String({ minLength: 1, maxLength: 500, description: 'The case file, as the check found it.' }),
    status: Type.Union(CHECK_OUTCOMES.map((s) => Type.Literal(s)), { description: 'pass, drift, invalid or error.' }),
    details: Type.Optional(Type.Unknown({ description: 'What the check found: figures out of tolerance (figure, want, got, difference, allowed) or the problems.' })),
    gitCommit: Type.Optional(Type.Union([Type.String({ maxLength: 64 }), Type.Null()], { description: 'The commit checked.' })),
  },
  { additionalProperties: false },
);
export type CheckResultPush = Static<typeof CheckResultPush>;

/** A batch from `panelpoint check --push`, in the order the cases were checked. */
export const CheckPush = Type.Array(CheckResultPush, { minItems: 1, maxItems: 1000, title: 'CheckPush' });
export type CheckPush = Static<typeof CheckPush>;
