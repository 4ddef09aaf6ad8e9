/**
 * The lines of a push (`POST /projects/:slug/runs`, application/x-ndjson): one `run` line with the
 * CLI's run.json, summary.json and study file, then `variants` lines of up to 2,000 JSONL records
 * each (shared/sweep/record-format.ts). Files the CLI writes may gain keys: the manifest, the
 * summary and the records accept keys they do not know; the envelopes do not.
 */
import { Type, type Static } from '@sinclair/typebox';

/** Most records in one `variants` line. */
export const ROWS_PER_LINE = 2000;

const Count = () => Type.Integer({ minimum: 0 });
const Hex = (min: number, max: number) => Type.String({ pattern: `^[0-9a-f]{${min},${max}}$` });

export const PushManifest = Type.Object(
  {
    panelpoint: Type.String({ maxLength: 32 }),
    runId: Type.String({ pattern: '^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$', description: "The CLI's uuid of the run." }),
    study: Type.Object({ name: Type.String({ minLength: 1, maxLength: 200 }), family: Type.String({ minLength: 1, maxLength: 64 }), hash: Hex(16, 16), file: Type.String() }),
    shard: Type.Object({ index: Type.Integer({ minimum: 1 }), count: Type.Integer({ minimum: 1, maximum: 9999 }) }),
    range: Type.Object({ start: Count(), end: Count() }),
    spaceSize: Count(),
    paramNames: Type.Array(Type.String({ minLength: 1, maxLength: 64 }), { maxItems: 100 }),
    combinations: Type.Array(Type.Object({ id: Type.String(), factors: Type.Record(Type.String(), Type.Number()), source: Type.String() })),
    status: Type.Union([Type.Literal('running'), Type.Literal('complete'), Type.Literal('interrupted'), Type.Literal('partial')], { description: "'partial': a merged folder with shards missing." }),
    nextIndex: Count(),
  },
  { additionalProperties: true },
);
export type PushManifest = Static<typeof PushManifest>;

const ByStatus = Type.Object({ determinate: Count(), indeterminate: Count(), unstable: Count(), error: Count() });

export const PushSummary = Type.Object(
  {
    objective: Type.Object({ figure: Type.String(), sense: Type.Union([Type.Literal('minimize'), Type.Literal('maximize')]) }),
    evaluated: Count(),
    filtered: Count(),
    byStatus: ByStatus,
    critical: Count(),
    best: Type.Array(Type.Object({ index: Count(), id: Type.String() }, { additionalProperties: true }), { maxItems: 100 }),
    reasons: Type.Array(Type.Object({ status: Type.String(), reason: Type.String(), count: Count() }, { additionalProperties: true }), { maxItems: 1000 }),
  },
  { additionalProperties: true },
);
export type PushSummary = Static<typeof PushSummary>;

export const RunLine = Type.Object(
  {
    kind: Type.Literal('run'),
    manifest: PushManifest,
    summary: PushSummary,
    study: Type.Object(
      { name: Type.String({ minLength: 1, maxLength: 200 }), family: Type.String({ minLength: 1, maxLength: 64 }), hash: Hex(16, 16), body: Type.Object({}, { additionalProperties: true }) },
      { additionalProperties: false },
    ),
    cliVersion: Type.String({ minLength: 1, maxLength: 32 }),
    gitCommit: Type.Union([Type.Null(), Hex(7, 64)]),
  },
  { additionalProperties: false, title: 'RunLine' },
);
export type RunLine = Static<typeof RunLine>;

const Name = () => Type.String({ maxLength: 64 });
const MemberPeak = () => Type.Union([Type.Null(), Type.Object({ value: Type.Number(), member: Name(), combination: Type.String() }, { additionalProperties: true })]);
const NodePeak = () => Type.Union([Type.Null(), Type.Object({ value: Type.Number(), node: Name(), combination: Type.String() }, { additionalProperties: true })]);
/** A design figure: a number, or `{ value }` (sized sweeps may add the member and check). */
const Figure = () => Type.Optional(Type.Union([Type.Null(), Type.Number(), Type.Object({ value: Type.Number() }, { additionalProperties: true })]));

/** One line of variants.jsonl. Forces kN, displacements m. */
export const VariantRecordLine = Type.Object(
  {
    index: Count(),
    id: Hex(16, 16),
    params: Type.Record(Type.String(), Type.Union([Type.Number(), Type.String(), Type.Null()])),
    status: Type.Union([Type.Literal('determinate'), Type.Literal('indeterminate'), Type.Literal('unstable'), Type.Literal('error')]),
    joints: Count(),
    members: Count(),
    reactions: Count(),
    k: Count(),
    s: Count(),
    critical: Type.Boolean(),
    peakTension: MemberPeak(),
    peakCompression: MemberPeak(),
    maxDisplacement: NodePeak(),
    spanOverDeflection: Type.Union([Type.Null(), Type.Number()]),
    reason: Type.Union([Type.Null(), Type.String()]),
    weight: Figure(),
    maxUtilisation: Figure(),
    /** Member design of a sized sweep: weight kN, largest utilisation, ... (null when not sized). */
    design: Type.Optional(Type.Union([Type.Null(), Type.Object({ weight: Type.Optional(Type.Number()), maxUtilisation: Type.Optional(Type.Number()) }, { additionalProperties: true })])),
  },
  { additionalProperties: true },
);
export type VariantRecordLine = Static<typeof VariantRecordLine>;

export const VariantsLine = Type.Object(
  { kind: Type.Literal('variants'), rows: Type.Array(Type.Unknown(), { minItems: 1, maxItems: ROWS_PER_LINE }) },
  { additionalProperties: false, title: 'VariantsLine' },
);
export type VariantsLine = Static<typeof VariantsLine>;
