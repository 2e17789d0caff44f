import { createHash } from 'node:crypto';
import bcrypt from 'bcryptjs';

// bcrypt reads only the first 72 bytes, and we allow 128 characters: hash a SHA-256 digest instead.
function prehash(password: string): string {
  return createHash('sha256').update(password.normalize('NFC')).digest('base64');
}

export function hashPassword(password: string, cost: number): Promise<string> {
  return bcrypt.hash(prehash(password), cost);
}

const dummyHashes = new Map<number, string>();

/** A hash of nothing at the given cost, compared against when there is no account. */
function dummyHash(cost: number): string {
  let hash = dummyHashes.get(cost);
  if (!hash) dummyHashes.set(cost, (hash = bcrypt.hashSync('not a real password', cost)));
  return hash;
}

/**
 * Compares with the same work whether or not there is a hash (`cost` is the cost real hashes
 * use), so timing does not tell who has an account.
 */
export async function verifyPassword(password: string, hash: string | null, cost: number): Promise<boolean> {
  const ok = await bcrypt.compare(prehash(password), hash ?? dummyHash(cost));
  return ok && hash !== null;
}
