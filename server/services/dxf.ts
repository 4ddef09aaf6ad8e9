/**
 * Reading an ASCII DXF drawing: the LINE entities of its ENTITIES section (start 10/20, end
 * 11/21; z 30/31 noted and dropped), every other entity counted by type and ignored, and the
 * drawing unit from the header's $INSUNITS. Binary DXF is refused.
 */

export interface DxfLine {
  x1: number;
  y1: number;
  x2: number;
  y2: number;
  /** 1-based line of the file where the entity starts. */
  at: number;
}

export interface DxfDrawing {
  lines: DxfLine[];
  /** Entities other than LINE, by type (CIRCLE, TEXT, LWPOLYLINE...). */
  ignored: Record<string, number>;
  /** LINE entities without all four coordinates, or with a coordinate that is not a finite number. */
  malformed: number;
  /** LINEs with a z coordinate other than 0 (the truss is plane: z is dropped). */
  withZ: number;
  /** The unit $INSUNITS names (mm, cm, m, in, ft), if any. */
  unit?: string;
}

/** A problem that stops the reading, with the file line it is at. */
export class DxfError extends Error {
  override readonly name = 'DxfError';
  constructor(readonly line: number, message: string) {
    super(message);
  }
}

/** $INSUNITS codes → mathjs length units (AutoCAD's table; 0 is "unitless"). */
const INSUNITS: Record<number, string> = { 1: 'in', 2: 'ft', 4: 'mm', 5: 'cm', 6: 'm', 8: 'uin', 9: 'mil', 10: 'yd', 14: 'dm' };

export const isBinaryDxf = (data: Buffer): boolean => data.subarray(0, 18).toString('latin1') === 'AutoCAD Binary DXF';

interface Pair { code: number; value: string; line: number }

function* pairs(text: string): Generator<Pair> {
  const rows = text.split(/\r\n|\r|\n/);
  // A trailing newline leaves one empty row.
  const n = rows.length - (rows[rows.length - 1] === '' ? 1 : 0);
  for (let i = 0; i < n; i += 2) {
    const raw = rows[i].trim();
    if (i + 1 >= n) {
      if (raw === '') return;
      throw new DxfError(i + 1, `group code ${raw} has no value (the file ends)`);
    }
    if (!/^-?\d+$/.test(raw)) throw new DxfError(i + 1, `expected a group code (a whole number), found ${JSON.stringify(raw.slice(0, 20))}`);
    yield { code: Number(raw), value: rows[i + 1].trim(), line: i + 1 };
  }
}

const COORD: Record<number, keyof Omit<DxfLine, 'at'>> = { 10: 'x1', 20: 'y1', 11: 'x2', 21: 'y2' };

/** Read an ASCII DXF text. @throws DxfError when it is not one */
export function readDxf(text: string): DxfDrawing {
  const out: DxfDrawing = { lines: [], ignored: {}, malformed: 0, withZ: 0 };
  let section: string | null = null;
  let expectName = false;
  let sawEntities = false;
  let entity: { type: string; at: number; c: Partial<Record<string, number>>; bad: boolean; z: boolean } | null = null;
  let headerVar: string | null = null;
  const finish = () => {
    if (!entity) return;
    if (entity.type === 'LINE') {
      const { x1, y1, x2, y2 } = entity.c;
      if (entity.bad || x1 === undefined || y1 === undefined || x2 === undefined || y2 === undefined) out.malformed++;
      else {
        out.lines.push({ x1, y1, x2, y2, at: entity.at });
        if (entity.z) out.withZ++;
      }
    } else {
      out.ignored[entity.type] = (out.ignored[entity.type] ?? 0) + 1;
    }
    entity = null;
  };
  for (const p of pairs(text)) {
    if (expectName) {
      expectName = false;
      if (p.code !== 2) throw new DxfError(p.line, 'SECTION without a name (group code 2)');
      section = p.value.toUpperCase();
      if (section === 'ENTITIES') sawEntities = true;
      continue;
    }
    if (p.code === 0) {
      finish();
      const v = p.value.toUpperCase();
      if (v === 'SECTION') {
        if (section) throw new DxfError(p.line, `SECTION inside the ${section} section (ENDSEC missing)`);
        expectName = true;
      } else if (v === 'ENDSEC') {
        section = null;
      } else if (v === 'EOF') {
        break;
      } else if (section === 'ENTITIES') {
        entity = { type: v, at: p.line, c: {}, bad: false, z: false };
      }
      continue;
    }
    if (section === 'HEADER') {
      if (p.code === 9) headerVar = p.value.toUpperCase();
      else if (headerVar === '$INSUNITS' && p.code === 70) out.unit = INSUNITS[Number(p.value)];
    } else if (entity?.type === 'LINE') {
      const key = COORD[p.code];
      const v = Number(p.value);
      if (key) {
        if (p.value === '' || !Number.isFinite(v)) entity.bad = true;
        else entity.c[key] = v;
      } else if ((p.code === 30 || p.code === 31) && Number(p.value) !== 0) {
        entity.z = true;
      }
    }
  }
  finish();
  if (section === 'ENTITIES') throw new DxfError(0, 'the ENTITIES section is not closed (ENDSEC missing)');
  if (!sawEntities) throw new DxfError(0, 'no ENTITIES section: this is not a DXF drawing, or it is empty');
  return out;
}
