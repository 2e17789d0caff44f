import { createHash } from 'node:crypto';
import bcrypt from 'bcryptjs';

// bcrypt reads only the first 72 bytes, and we allow 128 characters: hash a SHA-256 digest instead.
function prehash(password: string): string {
  return createHash('sha256').update(password.normalize('NFC')).digest('base64');
}

export function hashPassword(password: string, cost: number): Promise<string> {
  return bcrypt.hash(prehash(password), cost);
}

/** Compares in constant work whether or not there is a hash, so timing does not tell who exists. */
export async function verifyPassword(password: string, hash: string | null): Promise<boolean> {
  const ok = await bcrypt.compare(prehash(password), hash ?? DUMMY_HASH);
  return ok && hash !== null;
}

const DUMMY_HASH = bcrypt.hashSync('not a real password', 10);
