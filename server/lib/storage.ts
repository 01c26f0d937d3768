import { createHash, randomUUID } from 'node:crypto';
import { mkdir, readFile, writeFile } from 'node:fs/promises';
import { join } from 'node:path';

/**
 * Where uploaded files live: a folder outside the web root, files under random names. One small
 * interface so object storage can replace the folder later without touching the features.
 */
export interface FileStorage {
  put(content: Buffer): Promise<{ key: string; sha256: string }>;
  get(key: string): Promise<Buffer>;
}

export function localStorage(dir: string): FileStorage {
  return {
    async put(content) {
      await mkdir(dir, { recursive: true });
      const key = randomUUID();
      await writeFile(join(dir, key), content, { flag: 'wx' });
      return { key, sha256: createHash('sha256').update(content).digest('hex') };
    },
    async get(key) {
      if (!/^[0-9a-f-]{36}$/.test(key)) throw new Error('bad storage key');
      return readFile(join(dir, key));
    },
  };
}
