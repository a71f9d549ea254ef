import { Argon2id } from 'oslo/password';

// Argon2id with oslo's defaults (19 MiB, 2 passes, 1 lane: the OWASP minimum).
const argon2id = new Argon2id();

export function hashPassword(password: string): Promise<string> {
  return argon2id.hash(password);
}

export function verifyPassword(hash: string, password: string): Promise<boolean> {
  return argon2id.verify(hash, password);
}

/** A real hash of a random string, verified when an e-mail is unknown so timing does not tell. */
let decoy: Promise<string> | null = null;
export function decoyHash(): Promise<string> {
  decoy ??= argon2id.hash(crypto.randomUUID());
  return decoy;
}
