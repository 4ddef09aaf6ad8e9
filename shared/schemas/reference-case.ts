/**
 * The reference case file: a model (inline, a model file, or one variant of a study), the
 * classification and figures it must give, and the tolerance `panelpoint check` allows.
 * Expected figures are in the model's own units (its `units`; m and kN for study variants),
 * the same units `panelpoint analyze --json` reports; absolute tolerances are in kN and m.
 */
import { Type, type Static } from '@sinclair/typebox';
import { Model } from './model';
import { Study } from './study';

const Count = (description: string) => Type.Integer({ minimum: 0, description });

/** Where a case's expected values come from: its kind and a citation. */
export const ReferenceSource = Type.Object(
  {
    kind: Type.Union([Type.Literal('published'), Type.Literal('closed-form'), Type.Literal('demo')], {
      description: 'published: a value printed in a named book or paper; closed-form: a statics or compatibility solution worked by hand; demo: frozen from an invented demo structure (a regression reference, not an independent check).',
    }),
    citation: Type.String({ minLength: 1, description: 'Where the expected values come from: author, title, section, or the method and its assumptions.' }),
  },
  { additionalProperties: false, description: 'Where the expected values come from.' },
);
export type ReferenceSource = Static<typeof ReferenceSource>;

/** A model file named by a path relative to the case file. */
export const ModelFileRef = Type.Object(
  { file: Type.String({ minLength: 1, description: 'Path of a model file, relative to the folder of this case file.' }) },
  { additionalProperties: false, description: 'A model file beside (or near) the case.' },
);
export type ModelFileRef = Static<typeof ModelFileRef>;

/** The variant of a study: its 0-based index in the study's space, or its 16-hex-digit id. */
export const VariantSpec = Type.Union(
  [
    Type.Integer({ minimum: 0, description: '0-based index of the variant in the study space (before the `where` filters).' }),
    Type.String({ pattern: '^[0-9a-f]{16}$', description: 'Stable variant id (16 lowercase hex digits), as in variants.jsonl.' }),
  ],
  { description: 'Which variant of the study: its index or its id.' },
);
export type VariantSpec = Static<typeof VariantSpec>;

/** One variant of a study (a study file path or an inline study); rebuilt in m and kN. */
export const StudyVariantRef = Type.Object(
  {
    study: Type.Union([Type.String({ minLength: 1, description: 'Path of a study file, relative to the folder of this case file.' }), Study], {
      description: 'A study file path, or the study itself.',
    }),
    variant: VariantSpec,
  },
  { additionalProperties: false, description: 'One variant of a study, rebuilt from its family (units m and kN).' },
);
export type StudyVariantRef = Static<typeof StudyVariantRef>;

const ForceMap = Type.Record(Type.String({ minLength: 1 }), Type.Number(), {
  description: 'Member id → axial force, tension positive, in the model force unit.',
});
const ReactionMap = Type.Record(
  Type.String({ minLength: 1 }),
  Type.Object(
    {
      rx: Type.Optional(Type.Number({ description: 'Horizontal reaction, + to the right, in the model force unit.' })),
      ry: Type.Optional(Type.Number({ description: 'Vertical reaction, + upward, in the model force unit.' })),
    },
    { additionalProperties: false, minProperties: 1 },
  ),
  { description: 'Supported node id → reaction components in global axes.' },
);
const DisplacementMap = Type.Record(
  Type.String({ minLength: 1 }),
  Type.Object(
    {
      ux: Type.Optional(Type.Number({ description: 'Horizontal displacement, + to the right, in the model length unit.' })),
      uy: Type.Optional(Type.Number({ description: 'Vertical displacement, + upward, in the model length unit.' })),
    },
    { additionalProperties: false, minProperties: 1 },
  ),
  { description: 'Node id → joint displacement.' },
);

/** Expected figures of one loading, in the model units: forces and reactions in its force unit, displacements in its length unit. */
export const ExpectedLoading = Type.Object(
  { memberForces: Type.Optional(ForceMap), reactions: Type.Optional(ReactionMap), displacements: Type.Optional(DisplacementMap) },
  { additionalProperties: false, description: 'Figures of one loading; any section may be left out, and only the ids listed are compared.' },
);
export type ExpectedLoading = Static<typeof ExpectedLoading>;

/** Expected classification: counts j, m, r, k, s, the status and the critical-form flag, compared exactly. */
export const ExpectedClassification = Type.Object(
  {
    status: Type.Union([Type.Literal('unstable'), Type.Literal('determinate'), Type.Literal('indeterminate')], {
      description: 'unstable (k > 0), determinate (k = 0, s = 0) or indeterminate (k = 0, s > 0).',
    }),
    joints: Count('j, number of joints.'),
    members: Count('m, number of members.'),
    reactions: Count('r, number of reaction components.'),
    mechanisms: Count('k = 2j − rank(A), independent mechanisms.'),
    selfStress: Count('s = m + r − rank(A), independent states of self-stress.'),
    critical: Type.Boolean({ description: "True when Maxwell's count is met (m + r ≥ 2j) and the frame is still a mechanism." }),
  },
  { additionalProperties: false, description: 'Compared exactly.' },
);
export type ExpectedClassification = Static<typeof ExpectedClassification>;

/** Everything a case expects: the classification, figures per loading (model units), and a reserved weight (kN). */
export const ReferenceExpected = Type.Object(
  {
    classification: ExpectedClassification,
    results: Type.Optional(
      Type.Record(Type.String({ minLength: 1 }), ExpectedLoading, {
        description: 'Combination id (or load case id when the model has no combinations) → expected figures, in model units.',
      }),
    ),
    weight: Type.Optional(
      Type.Number({ minimum: 0, description: 'Total member weight, kN. Reserved for member design: not yet computed, so not compared.' }),
    ),
  },
  { additionalProperties: false, description: 'What the recomputation must give; figures in the model units.' },
);
export type ReferenceExpected = Static<typeof ReferenceExpected>;

/** Allowance per figure: |got − want| ≤ absolute (kN or m) + relative·|want|. */
export const ReferenceTolerance = Type.Object(
  {
    absolute: Type.Object(
      {
        force: Type.Number({ minimum: 0, description: 'Absolute allowance on forces and reactions, kN (converted to the model force unit).' }),
        displacement: Type.Number({ minimum: 0, description: 'Absolute allowance on displacements, m (converted to the model length unit).' }),
      },
      { additionalProperties: false },
    ),
    relative: Type.Number({ minimum: 0, description: 'Relative allowance: a figure passes when |got − want| ≤ absolute + relative·|want|.' }),
  },
  { additionalProperties: false, description: 'How far a recomputed figure may be from the expected one.' },
);
export type ReferenceTolerance = Static<typeof ReferenceTolerance>;

/** The reference case file. */
export const ReferenceCase = Type.Object(
  {
    $schema: Type.Optional(Type.String({ description: 'Path or URL of this schema, for editors.' })),
    name: Type.String({ minLength: 1, description: 'Name of the case, as reports and JUnit show it.' }),
    description: Type.Optional(Type.String({ description: 'Free text.' })),
    derivation: Type.Optional(
      Type.Union([Type.String(), Type.Array(Type.String())], {
        description: 'The hand working of the expected values (one string, or one line per item); not read by the check.',
      }),
    ),
    source: ReferenceSource,
    model: Type.Union([Model, ModelFileRef, StudyVariantRef], {
      description: 'The structure: a model object, { file } or { study, variant }.',
    }),
    expected: ReferenceExpected,
    tolerance: ReferenceTolerance,
  },
  {
    additionalProperties: false,
    $id: 'https://panelpoint.dev/schemas/reference-case.json',
    title: 'Panelpoint reference case',
    description: 'A structure and the results it must give, checked by `panelpoint check`.',
  },
);
export type ReferenceCase = Static<typeof ReferenceCase>;
