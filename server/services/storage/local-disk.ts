// FileStorage on the local disk, under one root folder (DATA_DIR/files), outside the web root.
import { mkdir, readFile, rename, unlink, writeFile } from 'node:fs/promises';
import { randomUUID } from 'node:crypto';
import { dirname, join, resolve } from 'node:path';
import { assertStorageKey, type FileStorage } from './storage';

const isMissing = (err: unknown) => (err as NodeJS.ErrnoException)?.code === 'ENOENT';

export function localDiskStorage(root: string): FileStorage {
  const base = resolve(root);
  const pathOf = (key: string) => {
    assertStorageKey(key);
    return join(base, key);
  };
  return {
    async put(key, buffer) {
      const path = pathOf(key);
      await mkdir(dirname(path), { recursive: true });
      // Write beside, then rename: a reader never sees half a file, a crash leaves only a temp file.
      const temp = `${path}.${randomUUID()}.tmp`;
      await writeFile(temp, buffer);
      await rename(temp, path);
    },
    async get(key) {
      try {
        return await readFile(pathOf(key));
      } catch (err) {
        if (isMissing(err)) return null;
        throw err;
      }
    },
    async delete(key) {
      try {
        await unlink(pathOf(key));
      } catch (err) {
        if (!isMissing(err)) throw err;
      }
    },
  };
}

/** The app's file store: DATA_DIR/files. */
export function dataDirStorage(dataDir: string): FileStorage {
  return localDiskStorage(join(dataDir, 'files'));
}
