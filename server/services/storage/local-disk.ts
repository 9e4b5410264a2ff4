// FileStorage on the local disk, under one root folder (DATA_DIR/files), outside the web root.
import { mkdir, readdir, readFile, rename, unlink, writeFile } from 'node:fs/promises';
import { randomUUID } from 'node:crypto';
import { dirname, join, relative, resolve, sep } from 'node:path';
import { assertStorageKey, type ListableStorage } from './storage';

const isMissing = (err: unknown) => (err as NodeJS.ErrnoException)?.code === 'ENOENT';

export function localDiskStorage(root: string): ListableStorage {
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
    async *keys() {
      let entries;
      try {
        entries = await readdir(base, { recursive: true, withFileTypes: true });
      } catch (err) {
        if (isMissing(err)) return;
        throw err;
      }
      for (const e of entries) {
        if (!e.isFile() || e.name.endsWith('.tmp')) continue; // a temp file is a write that never finished
        yield relative(base, join(e.parentPath, e.name)).split(sep).join('/');
      }
    },
  };
}

/** The app's file store: DATA_DIR/files. */
export function dataDirStorage(dataDir: string): ListableStorage {
  return localDiskStorage(join(dataDir, 'files'));
}
