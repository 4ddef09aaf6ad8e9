/**
 * Member design input: steel materials, section shapes and catalogues, and the design spec that
 * picks a code, a material and a catalogue for sizing. A quantity is a number in the stated
 * default unit or a string with a mathjs unit ("355 MPa", "50 ksi", "114.3 mm", "7850 kg/m^3").
 */
import { Type, type Static, type TProperties } from '@sinclair/typebox';

const Id = Type.String({ minLength: 1, maxLength: 64, description: 'Identifier, unique within its list.' });

const Qty = (description: string) =>
  Type.Union([Type.Number(), Type.String({ minLength: 1 })], { description });

/** A steel grade: strengths and modulus (kN/m² or with a unit), unit weight (kN/m³) or mass density. */
export const Material = Type.Object(
  {
    id: Id,
    name: Type.Optional(Type.String({ description: 'Display name, e.g. "S355J2H".' })),
    standard: Type.Optional(Type.String({ description: 'Product or design standard the values come from.' })),
    Fy: Qty('Yield strength; a number in kN/m² (355 MPa = 355000) or a string with a unit ("355 MPa", "50 ksi").'),
    Fu: Qty('Tensile strength; a number in kN/m² or a string with a unit.'),
    E: Qty('Elastic modulus; a number in kN/m² or a string with a unit ("210 GPa", "29000 ksi").'),
    density: Qty(
      'Unit weight: a number in kN/m³, a string with a weight unit ("77 kN/m^3"), or a mass density ("7850 kg/m^3", converted with g = 9.80665 m/s²).',
    ),
  },
  { additionalProperties: false, description: 'A structural steel grade.' },
);
export type Material = Static<typeof Material>;

const Dim = (what: string) => Qty(`${what}; a number in mm or a string with a unit ("4.5 in").`);

const CHS = { shape: Type.Literal('chs', { description: 'Shape kind: circular hollow section.' }), D: Dim('Outside diameter'), t: Dim('Nominal wall thickness (see wallFactor)') };
const SHS = { shape: Type.Literal('shs', { description: 'Shape kind: square hollow section.' }), B: Dim('Outside width'), t: Dim('Nominal wall thickness (see wallFactor)') };
const RHS = {
  shape: Type.Literal('rhs', { description: 'Shape kind: rectangular hollow section.' }),
  H: Dim('Outside depth, in the truss plane'),
  B: Dim('Outside width, normal to the truss plane'),
  t: Dim('Nominal wall thickness (see wallFactor)'),
};
const ROD = { shape: Type.Literal('rod', { description: 'Shape kind: solid round bar.' }), D: Dim('Diameter') };
const GIVEN = {
  shape: Type.Literal('given', { description: 'Shape kind: properties given directly.' }),
  A: Qty('Cross-section area; a number in mm² or a string with a unit ("12.5 cm^2").'),
  rx: Dim('Radius of gyration for buckling in the truss plane'),
  ry: Type.Optional(Dim('Radius of gyration for buckling out of the truss plane; default rx')),
};
const DESCRIBE = {
  chs: 'Circular hollow section: outside diameter D, wall thickness t.',
  shs: 'Square hollow section: outside width B, wall thickness t (corner radii ignored).',
  rhs: 'Rectangular hollow section: H in the truss plane, B across it, wall thickness t (corner radii ignored).',
  rod: 'Solid round bar of diameter D.',
  given: 'Properties given directly: area A and radii of gyration rx (in-plane buckling), ry (out-of-plane; default rx).',
};
const form = <P extends TProperties>(props: P, description: string) => Type.Object(props, { additionalProperties: false, description });

/** A section by shape and dimensions, mm unless a unit is given (area of `given`: mm²). */
export const SectionShape = Type.Union(
  [form(CHS, DESCRIBE.chs), form(SHS, DESCRIBE.shs), form(RHS, DESCRIBE.rhs), form(ROD, DESCRIBE.rod), form(GIVEN, DESCRIBE.given)],
  { description: 'A cross-section by its shape and dimensions (mm unless a unit is given).' },
);
export type SectionShape = Static<typeof SectionShape>;

const NAMED = { id: Id, name: Type.Optional(Type.String({ description: 'Display name, e.g. "CHS 114.3×6.0".' })) };

/** A catalogue entry: id, optional name, and a `SectionShape`. */
export const CatalogueSection = Type.Union(
  [
    form({ ...NAMED, ...CHS }, DESCRIBE.chs),
    form({ ...NAMED, ...SHS }, DESCRIBE.shs),
    form({ ...NAMED, ...RHS }, DESCRIBE.rhs),
    form({ ...NAMED, ...ROD }, DESCRIBE.rod),
    form({ ...NAMED, ...GIVEN }, DESCRIBE.given),
  ],
  { description: 'One catalogue section: an id, an optional name and a shape with its dimensions.' },
);
export type CatalogueSection = Static<typeof CatalogueSection>;

/** A list of candidate sections for sizing. */
export const Catalogue = Type.Object(
  {
    id: Id,
    name: Type.Optional(Type.String({ description: 'Display name of the catalogue.' })),
    sections: Type.Array(CatalogueSection, { minItems: 1, description: 'Candidate sections; any order (sizing sorts by weight).' }),
  },
  { additionalProperties: false, description: 'The sections auto-sizing may choose from.' },
);
export type Catalogue = Static<typeof Catalogue>;

/** The design code and method the checks follow. */
export const DesignCode = Type.Union(
  [
    Type.Literal('aisc360-16-lrfd', { description: 'AISC 360-16, LRFD (φ factors); give factored combinations.' }),
    Type.Literal('aisc360-16-asd', { description: 'AISC 360-16, ASD (Ω factors); give ASD combinations.' }),
    Type.Literal('en1993-1-1', { description: 'EN 1993-1-1 with the recommended γM values unless set.' }),
  ],
  { description: 'Design code and method.' },
);
export type DesignCode = Static<typeof DesignCode>;

/** An EN 1993-1-1 buckling curve (imperfection factor α from Table 6.1). */
export const BucklingCurve = Type.Union(
  [Type.Literal('a0'), Type.Literal('a'), Type.Literal('b'), Type.Literal('c'), Type.Literal('d')],
  {
    description:
      "EN 1993-1-1 Table 6.1/6.2 buckling curve (default by shape: 'a' for chs, shs, rhs as hot-finished hollow; 'c' for rod and given). Cold-formed hollow sections (EN 10219, ASTM A500) take 'c'.",
  },
);
export type BucklingCurve = Static<typeof BucklingCurve>;

const Member = Type.Literal('member', { description: 'The member length between its end joints.' });
const Metres = Type.Number({ exclusiveMinimum: 0, description: 'A fixed length, m.' });

/** What to design with: code, material, catalogue, groups, lengths and limits (lengths m, ratios plain). */
export const DesignSpec = Type.Object(
  {
    code: DesignCode,
    material: Type.Union([Type.String({ minLength: 1 }), Material], {
      description: 'A shipped grade id (see materials) or a material given in full.',
    }),
    catalogue: Type.Union([Type.String({ minLength: 1 }), Catalogue], {
      description: 'A shipped catalogue id (chs, shs, rod, all) or a catalogue given in full.',
    }),
    groups: Type.Optional(
      Type.Record(Type.String({ minLength: 1 }), Type.Array(Type.String({ minLength: 1 }), { minItems: 1 }), {
        description:
          'Design groups: name → member groups (top, bottom, diagonal, vertical, link, web) or member ids sized together. Members in no listed group are sized by their member group.',
      }),
    ),
    K: Type.Optional(Type.Number({ exclusiveMinimum: 0, description: 'Effective length factor (default 1.0: pin-ended members).' })),
    unbraced: Type.Optional(
      Type.Object(
        {
          inPlane: Type.Optional(Type.Union([Member, Metres], { description: 'Unbraced length for buckling in the truss plane (default member).' })),
          outOfPlane: Type.Optional(
            Type.Union([Member, Metres, Type.Record(Type.String({ minLength: 1 }), Metres)], {
              description: 'Unbraced length out of the plane (default member); a map gives metres per design or member group, the rest use the member length.',
            }),
          ),
        },
        { additionalProperties: false, description: 'Unbraced lengths for buckling in and out of the truss plane.' },
      ),
    ),
    netAreaFactor: Type.Optional(
      Type.Number({ exclusiveMinimum: 0, maximum: 1, description: 'Effective (AISC Ae/Ag) or net (EN Anet/A) area over gross area (default 0.85).' }),
    ),
    slenderness: Type.Optional(
      Type.Object(
        {
          compression: Type.Optional(Type.Number({ exclusiveMinimum: 0, description: 'Largest K·L/r of a compression member (default 200).' })),
          tension: Type.Optional(Type.Number({ exclusiveMinimum: 0, description: 'Largest L/r of a tension member (default 300).' })),
        },
        { additionalProperties: false, description: 'Slenderness limits (AISC 360-16 §E2 and §D1 user notes).' },
      ),
    ),
    deflectionLimit: Type.Optional(
      Type.Number({ exclusiveMinimum: 0, description: 'Span over the largest allowed vertical deflection, e.g. 300 for span/300 (default: not checked).' }),
    ),
    wallFactor: Type.Optional(
      Type.Number({
        exclusiveMinimum: 0,
        maximum: 1,
        description:
          'Design over nominal wall thickness of hollow sections, for strength and stiffness (weight uses the nominal). Default 0.93 for ASTM A500 HSS and A53 pipe under AISC 360-16 §B4.2 (electric-resistance welded), else 1.',
      }),
    ),
    selfWeight: Type.Optional(Type.Boolean({ description: 'Add member self-weight to the analysis (default true).' })),
    curve: Type.Optional(BucklingCurve),
    gammaM0: Type.Optional(Type.Number({ exclusiveMinimum: 0, description: 'EN 1993-1-1 §6.1 γM0 (default 1.0).' })),
    gammaM1: Type.Optional(Type.Number({ exclusiveMinimum: 0, description: 'EN 1993-1-1 §6.1 γM1 (default 1.0).' })),
    gammaM2: Type.Optional(Type.Number({ exclusiveMinimum: 0, description: 'EN 1993-1-1 §6.1 γM2 (default 1.25).' })),
  },
  { additionalProperties: false, $id: 'https://panelpoint.dev/schemas/design.json', title: 'Panelpoint design spec' },
);
export type DesignSpec = Static<typeof DesignSpec>;
