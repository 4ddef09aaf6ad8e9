import type { Request, Response } from 'express';
import { appDeps, currentProject, currentUser } from '../http/context';
import { importDxf } from '../services/uploads-import';
import { createUpload, listUploads, removeUpload, uploadContent } from '../services/uploads.service';
import { queryText } from './query-params';

export async function postUpload(req: Request, res: Response): Promise<void> {
  const kind: unknown = (req.body as { kind?: unknown } | undefined)?.kind ?? queryText(req, 'kind');
  res.status(201).json(await createUpload(appDeps(req), currentUser(req), currentProject(req), kind, req.file));
}

export async function getUploads(req: Request, res: Response): Promise<void> {
  res.json({ uploads: await listUploads(currentProject(req), queryText(req, 'kind')) });
}

/** The file itself, as an attachment under its uploaded name. */
export async function getUploadContent(req: Request, res: Response): Promise<void> {
  const { upload, data } = await uploadContent(appDeps(req), currentProject(req), String(req.params.id));
  res.type(upload.contentType).attachment(upload.originalName).send(data);
}

export async function deleteUpload(req: Request, res: Response): Promise<void> {
  await removeUpload(appDeps(req), currentUser(req), currentProject(req), String(req.params.id));
  res.status(204).end();
}

export async function postDxfImport(req: Request, res: Response): Promise<void> {
  res.status(201).json(await importDxf(appDeps(req), currentUser(req), currentProject(req), String(req.params.id), req.query));
}
