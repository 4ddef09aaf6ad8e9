/**
 * Uploaded files of a project: checked by kind (uploads-check.ts), kept in deps.storage under a
 * fresh uuid (the file's own name is stored as text only, never used as a path), listed,
 * downloaded and deleted. Importing a DXF drawing lives in uploads-import.ts.
 */
import { randomUUID } from 'node:crypto';
import type { AppDeps } from '../app-deps';
import { Upload, UPLOAD_KINDS, type UploadKind } from '../db/models/upload.model';
import { User } from '../db/models/user.model';
import type { ProjectAccess } from '../http/context';
import { forbidden, HttpError, notFound, type ErrorDetail } from '../http/http-error';
import { audit } from './audit.service';
import { storageOf } from './object-store-memory';
import { checkUpload } from './uploads-check';

export interface PublicUpload {
  id: number;
  kind: UploadKind;
  /** The name the file was uploaded with (display only). */
  name: string;
  /** Bytes. */
  size: number;
  contentType: string;
  createdAt: Date;
  createdBy: { id: number; name: string } | null;
}

export interface ReceivedFile {
  originalname: string;
  mimetype: string;
  buffer: Buffer;
}

export const publicUpload = (u: Upload, creator: User | null | undefined): PublicUpload => ({
  id: u.id, kind: u.kind, name: u.originalName, size: u.size, contentType: u.contentType, createdAt: u.createdAt,
  createdBy: creator ? { id: creator.id, name: creator.name } : null,
});

/** A display name without folders or control characters, at most 255 characters. */
export function safeName(name: string): string {
  const base = name.split(/[/\\]/).pop() ?? '';
  const clean = base.replace(/[\u0000-\u001f\u007f]/g, '').trim().slice(-255);
  return clean || 'upload';
}

export function parseKind(value: unknown): UploadKind {
  if (typeof value === 'string' && (UPLOAD_KINDS as readonly string[]).includes(value)) return value as UploadKind;
  throw new HttpError(422, 'invalid-upload', 'Say what the file is: kind study, model or dxf.', [{ path: 'kind', message: `must be one of ${UPLOAD_KINDS.join(', ')}` }]);
}

/** Keep bytes under a new key, then record them: a failure leaves at worst an unreferenced object. */
export async function storeUpload(deps: AppDeps, actor: User, access: ProjectAccess, kind: UploadKind, name: string, data: Buffer, contentType: string): Promise<Upload> {
  const storageKey = `uploads/${randomUUID()}`;
  try {
    await storageOf(deps).put(storageKey, data, contentType);
  } catch (e) {
    if (e instanceof HttpError) throw e;
    deps.logger?.error('upload not stored', { key: storageKey, error: e });
    throw new HttpError(503, 'storage-unavailable', 'The file cannot be stored right now; try again shortly.');
  }
  const row = await Upload.create({ projectId: access.project.id, kind, originalName: safeName(name), storageKey, size: data.length, contentType, createdBy: actor.id });
  await audit({ userId: actor.id, projectId: access.project.id, action: 'upload.create', entity: 'upload', entityId: row.id, details: { kind, name: row.originalName, size: row.size } });
  return row;
}

export interface CreatedUpload {
  upload: PublicUpload;
  summary: Record<string, unknown>;
  warnings: ErrorDetail[];
}

export async function createUpload(deps: AppDeps, actor: User, access: ProjectAccess, kindValue: unknown, file: ReceivedFile | undefined): Promise<CreatedUpload> {
  if (!file) throw new HttpError(422, 'file-missing', 'Send the file as multipart/form-data in the field "file".', [{ path: 'file', message: 'missing' }]);
  const kind = parseKind(kindValue);
  const checked = checkUpload(kind, file.originalname, file.mimetype, file.buffer);
  const row = await storeUpload(deps, actor, access, kind, file.originalname, file.buffer, checked.contentType);
  return { upload: publicUpload(row, actor), summary: checked.summary, warnings: checked.warnings };
}

export async function listUploads(access: ProjectAccess, kind?: unknown): Promise<PublicUpload[]> {
  const where = { projectId: access.project.id, ...(kind === undefined ? {} : { kind: parseKind(kind) }) };
  const rows = await Upload.findAll({ where, include: [{ model: User, as: 'creator' }], order: [['createdAt', 'DESC'], ['id', 'DESC']], limit: 500 });
  return rows.map((u) => publicUpload(u, (u as Upload & { creator?: User | null }).creator));
}

export async function findUpload(access: ProjectAccess, idText: string): Promise<Upload> {
  const id = /^\d{1,10}$/.test(idText) ? Number(idText) : NaN;
  const row = Number.isNaN(id) ? null : await Upload.findOne({ where: { id, projectId: access.project.id } });
  if (!row) throw notFound('upload-not-found', 'No such upload in this project.');
  return row;
}

export async function uploadContent(deps: AppDeps, access: ProjectAccess, idText: string): Promise<{ upload: Upload; data: Buffer }> {
  const upload = await findUpload(access, idText);
  try {
    return { upload, data: await storageOf(deps).get(upload.storageKey) };
  } catch (e) {
    if (e instanceof HttpError) throw e;
    deps.logger?.error('upload content unreadable', { uploadId: upload.id, error: e });
    throw new HttpError(503, 'storage-unavailable', 'The file cannot be read from storage right now; try again shortly.');
  }
}

/** The uploader may delete their own file; a project admin any file. */
export async function removeUpload(deps: AppDeps, actor: User, access: ProjectAccess, idText: string): Promise<void> {
  const upload = await findUpload(access, idText);
  if (upload.createdBy !== actor.id && !access.rights.has('project:admin')) throw forbidden('Only the uploader or a project admin may delete this file.', 'not-your-upload');
  await upload.destroy();
  await audit({ userId: actor.id, projectId: access.project.id, action: 'upload.delete', entity: 'upload', entityId: upload.id, details: { name: upload.originalName } });
  // The row is gone first: a failed removal leaves an unreferenced object, never a row without bytes.
  await storageOf(deps).remove(upload.storageKey).catch((e: unknown) => deps.logger?.warn('upload object not removed', { key: upload.storageKey, error: e }));
}
