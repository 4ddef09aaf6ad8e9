/**
 * The study file: one truss family, the parameters to hold and to vary, filters, loads,
 * combinations and the figures to record. Values are in each parameter's own unit
 * (see `panelpoint families`); loads follow study-loads.ts.
 */
import { Type, type Static } from '@sinclair/typebox';
import { StudyLoad } from './study-loads';
import { ModelCombination } from './model';
import { DesignSpec } from './design';

/** Parameter and expression names: identifiers, so that mathjs reads them as symbols. */
const NAME_PATTERN = '^[A-Za-z_][A-Za-z0-9_]*$';
const Name = Type.String({ pattern: NAME_PATTERN, description: 'Parameter name (an identifier).' });

/** A parameter value: a number in the parameter's unit, one of its options, or a quantity with a unit ("24 m"). */
export const ParamValue = Type.Union([Type.Number(), Type.String({ minLength: 1 })], {
  description: "A number in the parameter's unit, one of its options, or a quantity with a unit such as \"24 m\".",
});
export type ParamValue = Static<typeof ParamValue>;

export const VaryList = Type.Array(ParamValue, { minItems: 1, description: 'The values to take, in order.' });
export type VaryList = Static<typeof VaryList>;

export const VaryStep = Type.Object(
  {
    from: Type.Number({ description: "First value, in the parameter's unit." }),
    to: Type.Number({ description: "Last value, in the parameter's unit; included when a step lands on it within 1e-9." }),
    step: Type.Number({ exclusiveMinimum: 0, description: "Increment, in the parameter's unit; > 0." }),
  },
  { additionalProperties: false, description: 'Evenly spaced values from `from` to `to` by `step`.' },
);
export type VaryStep = Static<typeof VaryStep>;

export const VaryCount = Type.Object(
  {
    from: Type.Number({ description: "First value, in the parameter's unit." }),
    to: Type.Number({ description: "Last value, in the parameter's unit (always included)." }),
    count: Type.Integer({ minimum: 1, description: 'Number of evenly spaced values, ends included.' }),
  },
  { additionalProperties: false, description: '`count` evenly spaced values from `from` to `to`, both included.' },
);
export type VaryCount = Static<typeof VaryCount>;

export const VarySample = Type.Object(
  {
    sample: Type.Union([Type.Literal('uniform'), Type.Literal('lhs')], {
      description: 'uniform: independent random values; lhs: Latin hypercube, co-sampled with the other lhs dimensions of equal count.',
    }),
    min: Type.Number({ description: "Lower bound, in the parameter's unit (included)." }),
    max: Type.Number({ description: "Upper bound, in the parameter's unit (excluded)." }),
    count: Type.Integer({ minimum: 1, description: 'Number of samples.' }),
  },
  { additionalProperties: false, description: 'Random values from a seeded generator (see `samples.seed`).' },
);
export type VarySample = Static<typeof VarySample>;

export const VarySpec = Type.Union([VaryList, VaryStep, VaryCount, VarySample], {
  description: 'A list of values, a range (by step or by count), or a random sample.',
});
export type VarySpec = Static<typeof VarySpec>;

const CaseMap = Type.Record(Type.String({ minLength: 1 }), Type.String({ minLength: 1 }), {
  description: 'Preset role (D, L, Lr, S, R, W) → load case id of this study; unmapped roles use the case of the same name.',
});

export const PresetCombinations = Type.Union([
  Type.Object(
    {
      preset: Type.Literal('asce7-lrfd', { description: 'ASCE/SEI 7-16 §2.3.1 basic LRFD combinations.' }),
      cases: Type.Optional(CaseMap),
    },
    { additionalProperties: false },
  ),
  Type.Object(
    {
      preset: Type.Literal('en1990-6.10', { description: 'EN 1990 eq. (6.10), each variable action leading in turn.' }),
      cases: Type.Optional(CaseMap),
      psi0: Type.Optional(
        Type.Record(Type.String({ minLength: 1 }), Type.Number({ minimum: 0, maximum: 1 }), {
          description: 'ψ0 per variable role (EN 1990 Table A1.1); defaults L 0.7, Lr 0, S 0.5, W 0.6. A role given here becomes a variable action.',
        }),
      ),
    },
    { additionalProperties: false },
  ),
]);
export type PresetCombinations = Static<typeof PresetCombinations>;

export const StudyCombinations = Type.Union(
  [PresetCombinations, Type.Array(ModelCombination, { minItems: 1, description: 'Custom combinations.' })],
  { description: 'A preset of a standard, or custom factors. Default: each load case alone with factor 1.' },
);
export type StudyCombinations = Static<typeof StudyCombinations>;

const figureLiterals = () => [
  Type.Literal('peakTension', { description: 'Largest member tension over all combinations, kN.' }),
  Type.Literal('peakCompression', { description: 'Largest member compression over all combinations, kN (positive).' }),
  Type.Literal('maxAbsForce', { description: 'Largest |member force| over all combinations, kN.' }),
  Type.Literal('maxDisplacement', { description: 'Largest joint displacement over all combinations, m.' }),
  Type.Literal('spanOverDeflection', { description: 'Span divided by the largest vertical displacement (dimensionless).' }),
  Type.Literal('weight', { description: 'Total steel weight of the sized truss, kN (needs `design`; ranks only variants whose members all pass).' }),
  Type.Literal('maxUtilisation', { description: 'Largest member utilisation of the sized truss (needs `design`).' }),
];

/** Figures a sweep can record per variant; the unit of each is stated beside it. */
export const StudyFigure = Type.Union(figureLiterals(), { description: 'A figure recorded per variant.' });
export type StudyFigure = Static<typeof StudyFigure>;

export const StudyObjective = Type.Union(
  [
    Type.Object(
      { minimize: Type.Union(figureLiterals(), { description: 'The figure to make as small as possible.' }) },
      { additionalProperties: false },
    ),
    Type.Object(
      { maximize: Type.Union(figureLiterals(), { description: 'The figure to make as large as possible.' }) },
      { additionalProperties: false },
    ),
  ],
  { description: 'The figure that ranks the best variants.' },
);
export type StudyObjective = Static<typeof StudyObjective>;

// The design spec embedded without its $id: one schema may carry an $id only once per Ajv instance.
const { $id: _designId, title: _designTitle, ...designBody } = DesignSpec;
const DesignSpecInStudy = Type.Unsafe<DesignSpec>({
  ...designBody,
  description: 'Member design: size every member group from a catalogue for every variant (code, material, catalogue, groups, lengths, limits).',
});

export const Study = Type.Object(
  {
    $schema: Type.Optional(Type.String({ description: 'Path or URL of this schema, for editors.' })),
    name: Type.String({ minLength: 1, description: 'Name of the study.' }),
    description: Type.Optional(Type.String({ description: 'Free text; does not change the results.' })),
    family: Type.String({ minLength: 1, description: 'Truss family id, e.g. pratt, howe, warren (see `panelpoint families`).' }),
    fixed: Type.Optional(
      Type.Record(Name, ParamValue, { additionalProperties: false, description: 'Parameters held at one value.' }),
    ),
    vary: Type.Optional(
      Type.Record(Name, VarySpec, {
        additionalProperties: false,
        description: 'Parameters to vary; the space is their Cartesian product, the last one changing fastest.',
      }),
    ),
    samples: Type.Optional(
      Type.Object(
        { seed: Type.Optional(Type.Integer({ minimum: 0, maximum: 4294967295, description: 'Seed of all random samples (default 1).' })) },
        { additionalProperties: false, description: 'Settings shared by all sampled dimensions.' },
      ),
    ),
    derived: Type.Optional(
      Type.Record(Name, Type.String({ minLength: 1 }), {
        additionalProperties: false,
        description: 'Parameters computed from others by a mathjs expression, evaluated in the order written.',
      }),
    ),
    where: Type.Optional(
      Type.Array(Type.String({ minLength: 1 }), { description: 'Filters: mathjs boolean expressions a variant must all satisfy.' }),
    ),
    loads: Type.Optional(Type.Array(StudyLoad, { description: 'Loads by case, applied to every variant.' })),
    combinations: Type.Optional(StudyCombinations),
    record: Type.Optional(Type.Array(StudyFigure, { minItems: 1, uniqueItems: true, description: 'Figures to record per variant.' })),
    objective: Type.Optional(StudyObjective),
    design: Type.Optional(DesignSpecInStudy),
  },
  {
    additionalProperties: false,
    $id: 'https://panelpoint.dev/schemas/study.json',
    title: 'Panelpoint study',
    description: 'A parametric study of one truss family.',
  },
);
export type Study = Static<typeof Study>;
