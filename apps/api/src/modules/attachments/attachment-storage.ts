// Where attachment bytes live. Keys are generated here (random, fixed alphabet) and checked on every
// call, so no name that came with an upload ever reaches the file system and no key can leave the
// storage directory.
import { randomBytes } from 'node:crypto';
import { createReadStream } from 'node:fs';
import { mkdir, rename, rm, stat, writeFile } from 'node:fs/promises';
import path from 'node:path';
import type { Readable } from 'node:stream';

export interface StoredObject {
  stream: Readable;
  byteSize: number;
}

export interface AttachmentStorage {
  /** Stores bytes under a key from `newStorageKey()`; refuses to overwrite. `contentType` is for stores that keep it. */
  put(key: string, bytes: Buffer, contentType: string): Promise<void>;
  /** The stored bytes, or null when nothing is stored under the key. */
  get(key: string): Promise<StoredObject | null>;
  /** Removes the bytes; removing what is not there is not an error. */
  delete(key: string): Promise<void>;
}

// 24 random bytes as 48 lowercase hex digits: 192 bits, nothing to guess, nothing to escape
const keyPattern = /^[0-9a-f]{48}$/;

export function newStorageKey(): string {
  return randomBytes(24).toString('hex');
}

export function isStorageKey(key: string): boolean {
  return keyPattern.test(key);
}

function assertKey(key: string): void {
  if (!isStorageKey(key))
    throw new Error(`Not an attachment storage key: ${JSON.stringify(key.slice(0, 80))}`);
}

/**
 * Files under `root`, fanned out by the key's first two hex digits so no directory grows past a few
 * thousand entries. Writes go to a temporary name first and are renamed into place, so a reader never
 * sees half a file.
 */
export function createLocalDiskStorage(root: string): AttachmentStorage {
  const base = path.resolve(root);
  const fileFor = (key: string) => {
    assertKey(key);
    const file = path.join(base, key.slice(0, 2), key);
    // cannot happen with the key pattern; kept so a future change of the pattern cannot open a hole
    if (path.dirname(path.dirname(file)) !== base)
      throw new Error('Attachment path escapes the storage directory');
    return file;
  };

  return {
    async put(key, bytes) {
      const file = fileFor(key);
      await mkdir(path.dirname(file), { recursive: true, mode: 0o700 });
      const temporary = `${file}.${randomBytes(6).toString('hex')}.part`;
      try {
        await writeFile(temporary, bytes, { flag: 'wx', mode: 0o600 });
        // a second upload can never get the same random key; if it somehow did, keep the first file
        const existing = await stat(file).catch(() => null);
        if (existing) throw new Error(`An attachment is already stored under ${key}`);
        await rename(temporary, file);
      } finally {
        await rm(temporary, { force: true });
      }
    },

    async get(key) {
      const file = fileFor(key);
      const info = await stat(file).catch((err: NodeJS.ErrnoException) => {
        if (err.code === 'ENOENT') return null;
        throw err;
      });
      if (!info?.isFile()) return null;
      return { stream: createReadStream(file), byteSize: info.size };
    },

    async delete(key) {
      await rm(fileFor(key), { force: true });
    },
  };
}
