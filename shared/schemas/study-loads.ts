/**
 * Loads as a study states them, before they become joint loads.
 * A quantity is a number in the default unit, or a string with a mathjs unit ("0.75 kPa", "2 kN/m").
 */
import { Type, type Static } from '@sinclair/typebox';

export const Quantity = Type.Union([Type.Number(), Type.String({ minLength: 1 })], {
  description: 'A number in the default unit, or a string with a unit, e.g. "0.75 kPa".',
});
export type Quantity = Static<typeof Quantity>;

const Chord = Type.Union([Type.Literal('top'), Type.Literal('bottom')], { description: 'The loaded chord.' });
const Case = Type.String({ minLength: 1, description: 'Load case id, e.g. D, L, Lr, S, W.' });

export const AreaLoad = Type.Object(
  {
    case: Case,
    kind: Type.Literal('area'),
    value: Type.Union([Quantity], { description: 'Area load; default unit kN/m² (kPa). Positive acts downward.' }),
    spacing: Type.Union([Quantity], { description: 'Truss spacing (tributary width); default unit m.' }),
    chord: Chord,
    projection: Type.Optional(
      Type.Union([Type.Literal('plan'), Type.Literal('length')], {
        description: 'plan: per horizontal projection (snow, roof live); length: per chord length (cladding dead load). Default plan.',
      }),
    ),
  },
  { additionalProperties: false },
);

export const LineLoad = Type.Object(
  {
    case: Case,
    kind: Type.Literal('line'),
    value: Type.Union([Quantity], { description: 'Line load on the chord; default unit kN/m. Positive acts downward.' }),
    chord: Chord,
    projection: Type.Optional(Type.Union([Type.Literal('plan'), Type.Literal('length')])),
  },
  { additionalProperties: false },
);

export const PointLoad = Type.Object(
  {
    case: Case,
    kind: Type.Literal('point'),
    joint: Type.String({ minLength: 1, description: 'Joint id as the family names it (see `panelpoint families`).' }),
    fx: Type.Optional(Quantity),
    fy: Type.Optional(Quantity),
  },
  { additionalProperties: false },
);

export const SelfWeight = Type.Object(
  {
    case: Case,
    kind: Type.Literal('self-weight'),
    weight: Type.Optional(
      Type.Union([Quantity], { description: 'Weight per member length; default unit kN/m. Default: A × 78.5 kN/m³ (steel).' }),
    ),
  },
  { additionalProperties: false },
);

export const StudyLoad = Type.Union([AreaLoad, LineLoad, PointLoad, SelfWeight]);
export type StudyLoad = Static<typeof StudyLoad>;
