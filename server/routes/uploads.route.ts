import type { ResolvedDeps } from '../app-deps';
import { deleteUpload, getUploadContent, getUploads, postDxfImport, postUpload } from '../controllers/uploads.controller';
import { ApiRouter } from '../http/api-router';
import { authenticate } from '../middleware/authenticate';
import { requireRight } from '../middleware/require-right';
import { receiveFile } from '../services/uploads-receive';

export function uploadsRoutes({ config }: ResolvedDeps): ApiRouter {
  const file = receiveFile(config.uploadLimitBytes);
  return new ApiRouter('uploads')
    .post('/projects/:slug/uploads', {
      summary: 'Upload a study, model or DXF file', status: 201,
      description: 'multipart/form-data: `file` and `kind` (study | model | dxf). Studies and models are checked against the shared schemas (422 with JSON paths); DXF must be ASCII.',
    }, authenticate, requireRight('uploads:write'), file, postUpload)
    .get('/projects/:slug/uploads', 'Uploaded files, newest first (?kind=)', authenticate, requireRight('project:read'), getUploads)
    .get('/projects/:slug/uploads/:id', 'Download an uploaded file', authenticate, requireRight('project:read'), getUploadContent)
    .delete('/projects/:slug/uploads/:id', { summary: 'Delete an upload (the uploader, or a project admin)', status: 204 },
      authenticate, requireRight('uploads:write'), deleteUpload)
    .post('/projects/:slug/uploads/:id/import', {
      summary: 'Make a model from an uploaded DXF drawing', status: 201,
      description: 'LINE entities become members; ends within ?tolerance= (mm, default 1) become one joint. ?units= gives the drawing unit when the file does not. The model has no supports or loads yet; it is stored as an upload of kind model.',
    }, authenticate, requireRight('uploads:write'), postDxfImport);
}
