// Output files appear whole or not at all: write a temporary file beside the target, then rename.
import { closeSync, fsyncSync, openSync, renameSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { basename, dirname, join } from 'node:path';
import { randomBytes } from 'node:crypto';
import { InputError, issue } from '../../shared/errors';

const REASONS: Record<string, string> = {
  ENOENT: 'the directory does not exist',
  ENOTDIR: 'a part of the path is not a directory',
  EISDIR: 'it is a directory',
  EACCES: 'permission denied',
  EPERM: 'permission denied',
  EROFS: 'the file system is read-only',
};

/** Replace `path` with `text` (UTF-8) atomically; throws InputError when the place cannot be written. */
export function writeFileAtomic(path: string, text: string): void {
  const tmp = join(dirname(path), `.${basename(path)}.${process.pid}.${randomBytes(6).toString('hex')}.tmp`);
  let fd: number | undefined;
  try {
    let mode = 0o666;
    try {
      mode = statSync(path).mode & 0o777; // keep the permissions of the file being replaced
    } catch {
      // no file yet
    }
    fd = openSync(tmp, 'wx', mode);
    writeFileSync(fd, text, 'utf8');
    fsyncSync(fd);
    closeSync(fd);
    fd = undefined;
    renameSync(tmp, path);
  } catch (err) {
    if (fd !== undefined) closeSync(fd);
    rmSync(tmp, { force: true });
    const reason = REASONS[(err as NodeJS.ErrnoException).code ?? ''];
    if (reason) throw new InputError(path, [issue('file-unwritable', '', reason)]);
    throw err;
  }
}
