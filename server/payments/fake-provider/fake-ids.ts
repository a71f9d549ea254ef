import { randomBytes } from 'node:crypto';

const ALPHABET = 'ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz0123456789';

/** An id in the provider's style: a type prefix and 24 random letters and digits. */
export function fakeId(prefix: 'cs_test' | 'pi' | 'ch' | 're' | 'txn' | 'evt' | 'req'): string {
  const bytes = randomBytes(24);
  let s = '';
  for (const b of bytes) s += ALPHABET[b % ALPHABET.length];
  return `${prefix}_${s}`;
}
