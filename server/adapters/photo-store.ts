/**
 * Where uploaded photos live: a folder on disk outside the web root (config `UPLOADS_DIR`),
 * files named by the service (generated names only, never the uploader's).
 */
import { mkdir, readFile, rm, writeFile } from 'node:fs/promises';
import { basename, resolve } from 'node:path';

export interface PhotoStore {
  write(name: string, data: Buffer): Promise<void>;
  /** The file's bytes, or null when it is gone. */
  read(name: string): Promise<Buffer | null>;
  remove(name: string): Promise<void>;
}

export function createPhotoStore(dir: string): PhotoStore {
  const root = resolve(dir);
  let ready: Promise<unknown> | null = null;
  // basename() keeps a name from reaching outside the folder even if one ever came from input.
  const pathOf = (name: string) => resolve(root, basename(name));
  return {
    async write(name, data) {
      ready ??= mkdir(root, { recursive: true }).catch((err: unknown) => {
        ready = null;
        throw err;
      });
      await ready;
      await writeFile(pathOf(name), data, { flag: 'wx' });
    },
    async read(name) {
      try {
        return await readFile(pathOf(name));
      } catch (err) {
        if (err instanceof Error && 'code' in err && err.code === 'ENOENT') return null;
        throw err;
      }
    },
    async remove(name) {
      await rm(pathOf(name), { force: true });
    },
  };
}
