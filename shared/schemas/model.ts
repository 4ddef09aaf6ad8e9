/**
 * The model file: one plane pin-jointed truss with its supports, load cases and combinations.
 * One schema, used by the CLI, the server and the web app.
 */
import { Type, type Static } from '@sinclair/typebox';

const Id = Type.String({ minLength: 1, maxLength: 64, description: 'Identifier, unique within its list.' });
const Finite = (description: string) => Type.Number({ description });

export const ModelUnits = Type.Object(
  {
    length: Type.Optional(Type.String({ default: 'm', description: 'Unit of coordinates and displacements (mathjs unit: m, mm, ft, in).' })),
    force: Type.Optional(Type.String({ default: 'kN', description: 'Unit of loads, reactions and member forces (kN, N, kip, lbf).' })),
    area: Type.Optional(Type.String({ description: 'Unit of section areas; defaults to length².' })),
    modulus: Type.Optional(Type.String({ description: 'Unit of the elastic modulus; defaults to force/length² (MPa, GPa, ksi also accepted).' })),
  },
  { additionalProperties: false },
);
export type ModelUnits = Static<typeof ModelUnits>;

export const ModelNode = Type.Object(
  { id: Id, x: Finite('Horizontal coordinate, in units.length.'), y: Finite('Vertical coordinate, in units.length.') },
  { additionalProperties: false },
);
export type ModelNode = Static<typeof ModelNode>;

export const ModelMember = Type.Object(
  {
    id: Id,
    from: Type.String({ minLength: 1, description: 'Id of the start joint.' }),
    to: Type.String({ minLength: 1, description: 'Id of the end joint.' }),
    section: Type.Optional(Type.String({ minLength: 1, description: 'Id of a section; default A = 0.005 m², E = 2.0e8 kN/m².' })),
    group: Type.Optional(Type.String({ minLength: 1, description: 'Member group, e.g. top, bottom, diagonal, vertical.' })),
  },
  { additionalProperties: false },
);
export type ModelMember = Static<typeof ModelMember>;

export const ModelSection = Type.Object(
  {
    id: Id,
    A: Type.Number({ exclusiveMinimum: 0, description: 'Cross-section area, in units.area.' }),
    E: Type.Number({ exclusiveMinimum: 0, description: 'Elastic modulus, in units.modulus.' }),
    name: Type.Optional(Type.String()),
  },
  { additionalProperties: false },
);
export type ModelSection = Static<typeof ModelSection>;

export const ModelSupport = Type.Object(
  {
    node: Type.String({ minLength: 1, description: 'Id of the supported joint.' }),
    type: Type.Union([Type.Literal('pin'), Type.Literal('roller')], {
      description: 'pin: restrains x and y; roller: restrains one direction.',
    }),
    angle: Type.Optional(
      Type.Number({ description: 'Roller only: direction of the reaction in degrees from +x, counter-clockwise (default 90).' }),
    ),
  },
  { additionalProperties: false },
);
export type ModelSupport = Static<typeof ModelSupport>;

export const ModelLoad = Type.Object(
  {
    case: Type.String({ minLength: 1, description: 'Load case id, e.g. D, L, S, W.' }),
    node: Type.String({ minLength: 1, description: 'Id of the loaded joint.' }),
    fx: Type.Optional(Finite('Horizontal component, in units.force (+ to the right).')),
    fy: Type.Optional(Finite('Vertical component, in units.force (+ upward).')),
  },
  { additionalProperties: false },
);
export type ModelLoad = Static<typeof ModelLoad>;

export const ModelCombination = Type.Object(
  {
    id: Id,
    factors: Type.Record(Type.String({ minLength: 1 }), Type.Number(), { description: 'Factor per load case.' }),
    source: Type.Optional(Type.String({ description: 'Where the factors come from (standard and clause).' })),
  },
  { additionalProperties: false },
);
export type ModelCombination = Static<typeof ModelCombination>;

export const Model = Type.Object(
  {
    $schema: Type.Optional(Type.String()),
    name: Type.String({ minLength: 1, description: 'Name of the structure.' }),
    description: Type.Optional(Type.String()),
    units: Type.Optional(ModelUnits),
    nodes: Type.Array(ModelNode, { description: 'Joints.' }),
    members: Type.Array(ModelMember, { description: 'Two-force bars between joints.' }),
    sections: Type.Optional(Type.Array(ModelSection)),
    supports: Type.Array(ModelSupport),
    loads: Type.Optional(Type.Array(ModelLoad)),
    combinations: Type.Optional(Type.Array(ModelCombination)),
  },
  { additionalProperties: false, $id: 'https://panelpoint.dev/schemas/model.json', title: 'Panelpoint model' },
);
export type Model = Static<typeof Model>;
