import { mkdtemp, readdir, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { text } from 'node:stream/consumers';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { createLocalDiskStorage, isStorageKey, newStorageKey } from './attachment-storage';

let root: string;
beforeEach(async () => {
  root = await mkdtemp(path.join(tmpdir(), 'railyard-storage-'));
});
afterEach(() => rm(root, { recursive: true, force: true }));

describe('local disk attachment storage', () => {
  it('stores, reads back and deletes bytes under a generated key', async () => {
    const storage = createLocalDiskStorage(root);
    const key = newStorageKey();
    await storage.put(key, Buffer.from('diode mode 0.336 V'), 'text/plain');

    const stored = await storage.get(key);
    expect(stored!.byteSize).toBe(18);
    expect(await text(stored!.stream)).toBe('diode mode 0.336 V');

    await storage.delete(key);
    expect(await storage.get(key)).toBeNull();
    // deleting twice is fine
    await storage.delete(key);
  });

  it('generates keys that differ and contain only hex digits', () => {
    const keys = Array.from({ length: 1000 }, newStorageKey);
    expect(new Set(keys).size).toBe(1000);
    expect(keys.every((k) => /^[0-9a-f]{48}$/.test(k) && isStorageKey(k))).toBe(true);
  });

  it.each([
    '../escape',
    '../../etc/passwd',
    `${'a'.repeat(47)}/`,
    'photo.jpg',
    '',
    `${'0'.repeat(46)}..`,
  ])('refuses the key %j on every operation', async (key) => {
    const storage = createLocalDiskStorage(root);
    await expect(storage.put(key, Buffer.from('x'), 'image/png')).rejects.toThrow(
      /Not an attachment storage key/,
    );
    await expect(storage.get(key)).rejects.toThrow(/Not an attachment storage key/);
    await expect(storage.delete(key)).rejects.toThrow(/Not an attachment storage key/);
  });

  it('never overwrites what is stored under a key', async () => {
    const storage = createLocalDiskStorage(root);
    const key = newStorageKey();
    await storage.put(key, Buffer.from('first'), 'text/plain');
    await expect(storage.put(key, Buffer.from('second'), 'text/plain')).rejects.toThrow(
      /already stored/,
    );
    expect(await text((await storage.get(key))!.stream)).toBe('first');
  });

  it('keeps files inside its directory, fanned out by the first two digits, with no temporary files left', async () => {
    const storage = createLocalDiskStorage(root);
    const key = newStorageKey();
    await storage.put(key, Buffer.from('x'), 'image/png');
    expect(await readdir(root)).toEqual([key.slice(0, 2)]);
    expect(await readdir(path.join(root, key.slice(0, 2)))).toEqual([key]);
  });
});
