/**
 * Where uploaded files live (studies, models, DXF). The files engineer owns the implementation
 * (S3 or a local folder) and may extend this interface; the app passes it through as
 * `deps.storage` and routes reach it with `appDeps(req).storage`.
 */
export interface Storage {
  put(key: string, data: Buffer, contentType: string): Promise<void>;
  get(key: string): Promise<Buffer>;
  remove(key: string): Promise<void>;
}
