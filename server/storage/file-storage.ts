/**
 * Raw instrument files, kept for provenance. Content-addressed: the key is the SHA-256 of the
 * bytes, so the same file is stored once. Today the bytes live in PostgreSQL (stored_files);
 * an S3-compatible store can take this interface's place without touching its callers.
 */
import { createHash } from 'node:crypto';
import type { Db } from '../db/knex.ts';
import { storedFilesRepo } from '../db/repos/stored-files-repo.ts';

export interface FileStorage {
  /** Stores the bytes (within the caller's transaction where the backend allows) and returns their key. */
  put(trx: Db, bytes: Uint8Array): Promise<{ key: string; sha256: string }>;
  get(key: string): Promise<Uint8Array | null>;
}

export function sha256Hex(bytes: Uint8Array): string {
  return createHash('sha256').update(bytes).digest('hex');
}

export function createPgFileStorage(db: Db): FileStorage {
  return {
    async put(trx, bytes) {
      const sha256 = sha256Hex(bytes);
      await storedFilesRepo.putIfAbsent(trx, sha256, bytes);
      return { key: sha256, sha256 };
    },
    get: (key) => storedFilesRepo.get(db, key),
  };
}
