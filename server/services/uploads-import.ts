/**
 * DXF import: a stored DXF upload becomes a model (dxf-model.ts), stored as a new upload of kind
 * model. Query: `tolerance` (mm, or a length such as "0.05 in"; default 1 mm), `units` (the
 * drawing unit when the file does not state it, or to override it; default the file's
 * $INSUNITS, else mm) and `name`.
 */
import type { Model } from '../../shared/schemas/model';
import { lengthFactor, parseQuantity } from '../../shared/units';
import type { AppDeps } from '../app-deps';
import type { User } from '../db/models/user.model';
import type { ProjectAccess } from '../http/context';
import { HttpError } from '../http/http-error';
import { readDxf } from './dxf';
import { modelFromDrawing, type DxfImportReport } from './dxf-model';
import { checkUpload } from './uploads-check';
import { publicUpload, storeUpload, uploadContent, type PublicUpload } from './uploads.service';

export interface DxfImportQuery {
  tolerance?: unknown;
  units?: unknown;
  name?: unknown;
}

export interface DxfImport {
  upload: PublicUpload;
  /** The upload the model came from. */
  source: PublicUpload;
  model: Model;
  report: DxfImportReport;
}

const badQuery = (path: string, message: string) => new HttpError(422, 'invalid-query', 'The query is not valid.', [{ path, message }]);
const one = (v: unknown) => (Array.isArray(v) ? v[0] : v);

function toleranceMm(raw: unknown): number {
  if (raw === undefined || raw === '') return 1;
  const r = parseQuantity(String(raw), 'mm', 'mm');
  if (r.error !== undefined) throw badQuery('tolerance', r.error);
  if (!(r.value >= 0) || r.value > 1000) throw badQuery('tolerance', 'must be between 0 and 1000 mm');
  return r.value;
}

/** Metres per drawing unit, for a unit name. */
function unitFactor(unit: string): number {
  const f = lengthFactor(unit);
  if (f.error !== undefined) throw badQuery('units', f.error);
  return f.value;
}

export async function importDxf(deps: AppDeps, actor: User, access: ProjectAccess, idText: string, q: DxfImportQuery): Promise<DxfImport> {
  const { upload, data } = await uploadContent(deps, access, idText);
  if (upload.kind !== 'dxf') throw new HttpError(422, 'not-a-drawing', `Upload ${upload.id} is a ${upload.kind} file, not a DXF drawing.`);
  checkUpload('dxf', upload.originalName, upload.contentType, data);
  const drawing = readDxf(data.toString('latin1'));
  if (!drawing.lines.length) throw new HttpError(422, 'no-lines', 'The drawing has no LINE entities to make members of.');
  const given = one(q.units);
  const unit = typeof given === 'string' && given ? given : (drawing.unit ?? 'mm');
  const mm = toleranceMm(one(q.tolerance));
  const tolerance = (mm / 1000) / unitFactor(unit);
  const base = upload.originalName.replace(/\.dxf$/i, '');
  const nameParam = one(q.name);
  const name = typeof nameParam === 'string' && nameParam.trim() ? nameParam.trim().slice(0, 200) : base;
  const { model, report } = modelFromDrawing(drawing, { name, source: upload.originalName, unit, tolerance, toleranceMm: mm });
  if (!(typeof given === 'string' && given) && !drawing.unit) report.notes.unshift('The drawing does not state its unit ($INSUNITS): mm assumed. Pass ?units=m (or in, ft) if it is drawn in another unit.');
  const bytes = Buffer.from(JSON.stringify(model, null, 2) + '\n', 'utf8');
  // The same check as an uploaded model: the import must give a file the model upload accepts.
  checkUpload('model', `${base}.model.json`, 'application/json', bytes);
  const row = await storeUpload(deps, actor, access, 'model', `${base}.model.json`, bytes, 'application/json');
  return { upload: publicUpload(row, actor), source: publicUpload(upload, null), model, report };
}
