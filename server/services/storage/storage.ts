// Where uploaded photos and their derived images live: the local disk (one machine) or an
// S3-compatible bucket (several instances), chosen by configuration; both implement these calls. Keys are server-made ("derived/<sha256>.webp"), never a
// name a client chose, and never served directly: the files route checks who may read them.

export interface FileStorage {
  /** Stores `buffer` under `key`, replacing what was there. */
  put(key: string, buffer: Buffer): Promise<void>;
  /** The stored bytes, or null when nothing is stored under `key`. */
  get(key: string): Promise<Buffer | null>;
  /** Removes `key`; removing a missing key is not an error. */
  delete(key: string): Promise<void>;
}

/** A store that can also list what it holds, for backups. */
export interface ListableStorage extends FileStorage {
  /** Every stored key, in no particular order. */
  keys(): AsyncIterable<string>;
}

// Lower-case letters, digits, dots, hyphens and underscores in one or more folders: no "..", no
// leading slash, nothing a path could escape with.
const KEY_PATTERN = /^[a-z0-9][a-z0-9_-]*(\/[a-z0-9][a-z0-9_.-]*)+$/;

export function assertStorageKey(key: string): void {
  if (!KEY_PATTERN.test(key) || key.includes('..')) throw new Error(`Not a storage key: ${JSON.stringify(key)}`);
}
