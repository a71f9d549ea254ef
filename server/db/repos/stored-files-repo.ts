import type { Knex } from 'knex';

/** Raw bytes by content key: the PostgreSQL backend of the file storage. */
export const storedFilesRepo = {
  /** Inserts unless the key exists (same key, same bytes). */
  async putIfAbsent(db: Knex, key: string, bytes: Uint8Array): Promise<void> {
    await db('stored_files')
      .insert({ key, size_bytes: bytes.byteLength, bytes: Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength) })
      .onConflict('key')
      .ignore();
  },

  async get(db: Knex, key: string): Promise<Uint8Array | null> {
    const row = await db('stored_files').where({ key }).first('bytes');
    return row ? new Uint8Array(row.bytes as Buffer) : null;
  },
};
