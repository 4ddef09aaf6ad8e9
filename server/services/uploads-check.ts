/**
 * What an uploaded file must be, by kind: a study or a model as JSON that passes the shared
 * schemas (study: shared/sweep/resolve-study.ts, model: shared/engine/to-structure.ts), or an
 * ASCII DXF drawing. A wrong type is 415; a file of the right type with problems is 422, with
 * one `{ path, message }` per problem (JSON paths like `members[3].to`).
 */
import { parse, printParseErrorCode, type ParseError } from 'jsonc-parser';
import { toStructure } from '../../shared/engine/to-structure';
import { resolveStudy } from '../../shared/sweep/resolve-study';
import type { UploadKind } from '../db/models/upload.model';
import { HttpError, type ErrorDetail } from '../http/http-error';
import { DxfError, isBinaryDxf, readDxf } from './dxf';

export interface CheckedUpload {
  contentType: string;
  /** A few facts about the file for the answer (family, joints, lines...). */
  summary: Record<string, unknown>;
  /** Problems that do not stop the upload (a model without supports yet). */
  warnings: ErrorDetail[];
}

const EXTENSIONS: Record<UploadKind, string[]> = { study: ['.json'], model: ['.json'], dxf: ['.dxf'] };

const unsupported = (message: string) => new HttpError(415, 'unsupported-type', message);
const invalid = (kind: string, details: ErrorDetail[]) => new HttpError(422, 'invalid-file', `The ${kind} file is not valid.`, details);

function lineColumn(text: string, offset: number): string {
  const before = text.slice(0, offset).split(/\r\n|\r|\n/);
  return `line ${before.length}, column ${before[before.length - 1].length + 1}`;
}

/** Parse JSON (a BOM allowed); 422 at the first syntax error with its line and column. */
function parseJson(kind: string, data: Buffer): unknown {
  const text = data.toString('utf8').replace(/^\uFEFF/, '');
  try {
    return JSON.parse(text) as unknown;
  } catch {
    const errors: ParseError[] = [];
    parse(text, errors, { disallowComments: true, allowTrailingComma: false });
    const e = errors[0];
    const where = e ? `${lineColumn(text, e.offset)}: ${printParseErrorCode(e.error)}` : 'not JSON';
    throw invalid(kind, [{ path: '', message: `not valid JSON (${where})` }]);
  }
}

function checkType(kind: UploadKind, name: string, mimetype: string, data: Buffer): void {
  const ext = /\.[^./\\]+$/.exec(name.toLowerCase())?.[0] ?? '';
  if (ext && !EXTENSIONS[kind].includes(ext)) throw unsupported(`A ${kind} upload must be a ${EXTENSIONS[kind].join(' or ')} file, not ${ext}.`);
  // Study, model and drawing files are text: only application/* and text/* types (and DXF's image/vnd.dxf) pass.
  const top = mimetype.split('/')[0];
  if (mimetype && top !== 'application' && top !== 'text' && mimetype !== 'image/vnd.dxf') throw unsupported(`A ${kind} upload cannot be ${mimetype}.`);
  if (kind === 'dxf' && isBinaryDxf(data)) throw unsupported('Binary DXF is not read: save the drawing as ASCII DXF.');
  if (data.includes(0)) throw unsupported(`A ${kind} upload must be a text file; this one holds binary data.`);
}

function checkStudy(data: Buffer): CheckedUpload {
  const doc = parseJson('study', data);
  const r = resolveStudy(doc);
  if (!r.setup || r.issues.length) throw invalid('study', r.issues.map(({ path, message }) => ({ path, message })));
  const s = doc as { name: string; family: string };
  return { contentType: 'application/json', summary: { name: s.name, family: s.family, combinations: r.combinations.length }, warnings: [] };
}

function checkModel(data: Buffer): CheckedUpload {
  const doc = parseJson('model', data);
  const r = toStructure(doc);
  // A model without supports is kept (the DXF import makes such models); it cannot be analysed yet.
  const blocking = r.issues.filter((i) => i.code !== 'no-supports');
  if (blocking.length) throw invalid('model', blocking.map(({ path, message }) => ({ path, message })));
  const m = doc as { name: string; nodes: unknown[]; members: unknown[] };
  const warnings = r.issues.filter((i) => i.code === 'no-supports').map(({ path, message }) => ({ path, message }));
  return { contentType: 'application/json', summary: { name: m.name, joints: m.nodes.length, members: m.members.length }, warnings };
}

function checkDxf(data: Buffer): CheckedUpload {
  try {
    const d = readDxf(data.toString('latin1'));
    const ignored = Object.values(d.ignored).reduce((s, n) => s + n, 0);
    const warnings = d.lines.length ? [] : [{ path: '', message: 'the drawing has no LINE entities: there is nothing to import' }];
    return { contentType: 'image/vnd.dxf', summary: { lines: d.lines.length, ignored, unit: d.unit ?? null }, warnings };
  } catch (e) {
    if (e instanceof DxfError) throw invalid('DXF', [{ path: e.line ? `line ${e.line}` : '', message: e.message }]);
    throw e;
  }
}

/** Check a file for its kind; throws 415 or 422. */
export function checkUpload(kind: UploadKind, name: string, mimetype: string, data: Buffer): CheckedUpload {
  checkType(kind, name, mimetype, data);
  if (kind === 'study') return checkStudy(data);
  if (kind === 'model') return checkModel(data);
  return checkDxf(data);
}
