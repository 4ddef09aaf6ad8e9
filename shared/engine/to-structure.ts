/**
 * From a parsed model file to the engine's `Structure`: schema, semantic checks, and the
 * conversion of every number to SI (m, kN, m², kN/m²).
 */
import { Model, type ModelNode } from '../schemas/model';
import { compileSchema } from '../schemas/validate';
import { formatPath, issue, type Issue } from '../errors';
import { areaFactor, forceFactor, lengthFactor, modulusFactor, type UnitResult } from '../units';
import type { CombinationDef, Structure, SupportDef } from './structure';

/** Area of a member without a section, m². */
const DEFAULT_A = 0.005;
/** Elastic modulus of a member without a section, kN/m² (200 GPa, structural steel; common practice). */
const DEFAULT_E = 2.0e8;
/** Joints closer than this fraction of the model's extent count as one place. */
const COINCIDENT = 1e-9;

/** The outcome of checking a model: a structure when there are no issues. */
export interface ModelCheck {
  /** The truss in SI units; undefined when `issues` is not empty. */
  structure?: Structure;
  issues: Issue[];
  /** The file's length and force units, and metres / kN per one of them (NaN when unknown). */
  units: { length: string; force: string; lengthFactor: number; forceFactor: number };
}

interface Factors { length: number; force: number; area: number; modulus: number }

const validateModel = compileSchema(Model);
const isObject = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null && !Array.isArray(v);

function resolveUnits(raw: unknown, issues: Issue[]): { summary: ModelCheck['units']; f: Factors } {
  const u = isObject(raw) ? raw : {};
  const str = (k: string) => (typeof u[k] === 'string' ? (u[k] as string) : undefined);
  const take = (key: string, r: UnitResult): number => {
    if (r.error === undefined) return r.value;
    issues.push({ path: `units.${key}`, code: r.code, message: r.error });
    return NaN;
  };
  const length = str('length') ?? 'm';
  const force = str('force') ?? 'kN';
  const L = take('length', lengthFactor(length));
  const F = take('force', forceFactor(force));
  const area = str('area');
  const modulus = str('modulus');
  // Defaults follow the file's own units: area in length², modulus in force/length².
  const A = area === undefined ? L * L : take('area', areaFactor(area));
  const E = modulus === undefined ? F / (L * L) : take('modulus', modulusFactor(modulus));
  return { summary: { length, force, lengthFactor: L, forceFactor: F }, f: { length: L, force: F, area: A, modulus: E } };
}

function indexIds(list: readonly { id: string }[], kind: string, name: string, issues: Issue[]): Map<string, number> {
  const index = new Map<string, number>();
  list.forEach((item, i) => {
    const first = index.get(item.id);
    if (first === undefined) index.set(item.id, i);
    else issues.push(issue('duplicate-id', `${name}[${i}].id`, kind, item.id, `${name}[${first}]`));
  });
  return index;
}

/** Largest extent of the joints, in file units. */
function extent(nodes: readonly ModelNode[]): number {
  let [x0, x1, y0, y1] = [Infinity, -Infinity, Infinity, -Infinity];
  for (const n of nodes) [x0, x1, y0, y1] = [Math.min(x0, n.x), Math.max(x1, n.x), Math.min(y0, n.y), Math.max(y1, n.y)];
  return nodes.length ? Math.max(x1 - x0, y1 - y0) : 0;
}

/** Report each joint that sits on an earlier one, against the earliest such joint. */
function checkCoincident(nodes: readonly ModelNode[], tol: number, issues: Issue[]): void {
  const order = nodes.map((_, i) => i).sort((a, b) => nodes[a].x - nodes[b].x);
  const partner = new Map<number, number>();
  for (let s = 0; s < order.length; s++) {
    const a = nodes[order[s]];
    for (let t = s + 1; t < order.length && nodes[order[t]].x - a.x <= tol; t++) {
      const b = nodes[order[t]];
      if (Math.hypot(b.x - a.x, b.y - a.y) > tol) continue;
      const [lo, hi] = [Math.min(order[s], order[t]), Math.max(order[s], order[t])];
      const prev = partner.get(hi);
      if (prev === undefined || lo < prev) partner.set(hi, lo);
    }
  }
  for (const [hi, lo] of [...partner].sort((p, r) => p[0] - r[0]))
    issues.push(issue('coincident-nodes', `nodes[${hi}]`, nodes[hi].id, nodes[lo].id, `nodes[${lo}]`));
}

interface Indexed { nodes: Map<string, number>; sections: Map<string, number>; cases: string[] }

function checkModel(m: Model, issues: Issue[]): Indexed {
  if (m.nodes.length === 0) issues.push(issue('model-empty', 'nodes', 'nodes'));
  if (m.members.length === 0) issues.push(issue('model-empty', 'members', 'members'));
  const nodes = indexIds(m.nodes, 'node', 'nodes', issues);
  indexIds(m.members, 'member', 'members', issues);
  const sections = indexIds(m.sections ?? [], 'section', 'sections', issues);
  const tol = COINCIDENT * extent(m.nodes);
  checkCoincident(m.nodes, tol, issues);
  m.members.forEach((mem, i) => {
    const a = nodes.get(mem.from);
    const b = nodes.get(mem.to);
    if (a === undefined) issues.push(issue('unknown-node', `members[${i}].from`, mem.from));
    if (b === undefined) issues.push(issue('unknown-node', `members[${i}].to`, mem.to));
    if (a !== undefined && b !== undefined) {
      const [p, r] = [m.nodes[a], m.nodes[b]];
      if (a === b) issues.push(issue('member-self', `members[${i}].to`, mem.to));
      else if (Math.hypot(r.x - p.x, r.y - p.y) <= tol) issues.push(issue('member-zero-length', `members[${i}]`, mem.from, mem.to));
    }
    if (mem.section !== undefined && !sections.has(mem.section))
      issues.push(issue('unknown-section', `members[${i}].section`, mem.section));
  });
  const supported = new Map<string, number>();
  m.supports.forEach((s, i) => {
    const first = supported.get(s.node);
    if (!nodes.has(s.node)) issues.push(issue('unknown-node', `supports[${i}].node`, s.node));
    else if (first !== undefined) issues.push(issue('support-duplicate', `supports[${i}].node`, s.node, `supports[${first}]`));
    else supported.set(s.node, i);
  });
  if (m.supports.length === 0) issues.push(issue('no-supports', 'supports'));
  const cases: string[] = [];
  (m.loads ?? []).forEach((l, i) => {
    if (!nodes.has(l.node)) issues.push(issue('unknown-node', `loads[${i}].node`, l.node));
    if (!cases.includes(l.case)) cases.push(l.case);
  });
  const combos = m.combinations ?? [];
  indexIds(combos, 'combination', 'combinations', issues);
  combos.forEach((c, i) => {
    for (const name of Object.keys(c.factors))
      if (!cases.includes(name)) issues.push(issue('unknown-case', formatPath(['combinations', i, 'factors', name]), name));
  });
  return { nodes, sections, cases };
}

/** Convert a checked model; pushes an issue for any number that overflows or vanishes in SI. */
function build(m: Model, f: Factors, ix: Indexed, issues: Issue[]): Structure | undefined {
  const finite = (v: number, path: string, what: string) => {
    if (!Number.isFinite(v)) issues.push(issue('out-of-range', path, what));
  };
  const n = m.nodes.length;
  const x = Float64Array.from(m.nodes, (p) => p.x * f.length);
  const y = Float64Array.from(m.nodes, (p) => p.y * f.length);
  for (let i = 0; i < n; i++) {
    finite(x[i], `nodes[${i}].x`, 'x in metres');
    finite(y[i], `nodes[${i}].y`, 'y in metres');
  }
  const sectionEA = (m.sections ?? []).map((s, i) => {
    const ea = s.E * f.modulus * (s.A * f.area);
    if (!(ea > 0 && Number.isFinite(ea))) issues.push(issue('out-of-range', `sections[${i}]`, 'E·A in kN'));
    return ea;
  });
  const EA = Float64Array.from(m.members, (mem) =>
    mem.section === undefined ? DEFAULT_E * DEFAULT_A : sectionEA[ix.sections.get(mem.section)!],
  );
  const caseLoads = ix.cases.map(() => new Float64Array(2 * n));
  (m.loads ?? []).forEach((l, i) => {
    const row = caseLoads[ix.cases.indexOf(l.case)];
    const k = 2 * ix.nodes.get(l.node)!;
    row[k] += (l.fx ?? 0) * f.force;
    row[k + 1] += (l.fy ?? 0) * f.force;
    finite(row[k], `loads[${i}].fx`, 'the sum of fx in kN');
    finite(row[k + 1], `loads[${i}].fy`, 'the sum of fy in kN');
  });
  const supports: SupportDef[] = m.supports.map((s) => ({
    node: ix.nodes.get(s.node)!,
    kind: s.type,
    // Reduce first so that a large angle keeps its precision.
    angle: s.type === 'roller' ? ((((s.angle ?? 90) % 360) + 360) % 360) * (Math.PI / 180) : 0,
  }));
  const combinations: CombinationDef[] = (m.combinations ?? []).map((c) => {
    const factors = new Float64Array(ix.cases.length);
    for (const [name, v] of Object.entries(c.factors)) factors[ix.cases.indexOf(name)] = v;
    return c.source === undefined ? { id: c.id, factors } : { id: c.id, factors, source: c.source };
  });
  if (issues.length) return undefined;
  const hasGroups = m.members.some((mem) => mem.group !== undefined);
  return {
    name: m.name,
    nodeIds: m.nodes.map((p) => p.id),
    memberIds: m.members.map((mem) => mem.id),
    from: Int32Array.from(m.members, (mem) => ix.nodes.get(mem.from)!),
    to: Int32Array.from(m.members, (mem) => ix.nodes.get(mem.to)!),
    supports,
    ...(hasGroups ? { groups: m.members.map((mem) => mem.group ?? '') } : {}),
    x, y, EA,
    cases: ix.cases, caseLoads, combinations,
  };
}

/**
 * Validate a parsed model (schema + semantics) and convert it to SI.
 * Coordinates become metres, loads kN (summed per case and joint), E·A kN; roller angles
 * radians (default 90°), pin angles 0. A member without a section gets A = 0.005 m² and
 * E = 2.0e8 kN/m² (200 GPa). Cases are ordered as they first appear in `loads`; a case a
 * combination leaves out has factor 0. Semantic checks run only once the schema passes.
 * @param data - the parsed JSON document
 * @returns the structure, or the issues that prevent it, each with a dotted path
 */
export function toStructure(data: unknown): ModelCheck {
  const issues = validateModel(data);
  const { summary, f } = resolveUnits(isObject(data) ? data.units : undefined, issues);
  if (issues.length && issues.some((i) => !i.path.startsWith('units.'))) return { issues, units: summary };
  const m = data as Model;
  const ix = checkModel(m, issues);
  const structure = issues.length ? undefined : build(m, f, ix, issues);
  return structure ? { structure, issues, units: summary } : { issues, units: summary };
}
