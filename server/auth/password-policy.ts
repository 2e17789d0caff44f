import { readFileSync } from 'node:fs';
import dumbPasswords from 'dumb-passwords';
import { passwordLength, PASSWORD_MAX_LENGTH, PASSWORD_MIN_LENGTH } from '../../shared/password-policy.js';

const ownList = new Set(
  readFileSync(new URL('./common-passwords.txt', import.meta.url), 'utf8')
    .split('\n')
    .map((line) => line.trim().toLowerCase())
    .filter((line) => line && !line.startsWith('#')),
);

function isCommon(candidate: string): boolean {
  return ownList.has(candidate) || dumbPasswords.check(candidate);
}

/** The shortest string that, repeated, makes up `value` ("abcabc" -> "abc"). */
function repeatedUnit(value: string): string {
  for (let size = 1; size <= value.length / 2; size++) {
    if (value.length % size === 0 && value.slice(0, size).repeat(value.length / size) === value) return value.slice(0, size);
  }
  return value;
}

/**
 * Checks a new password as NIST SP 800-63B-4 section 3.1.1.2 asks: length 15 to at least 64, no
 * composition rules, and not a commonly used or context-specific password. Returns the reason it
 * is refused, or null.
 */
export function passwordProblem(password: string, context: { email?: string; name?: string } = {}): string | null {
  const length = passwordLength(password);
  if (length < PASSWORD_MIN_LENGTH) return `Use at least ${PASSWORD_MIN_LENGTH} characters.`;
  if (length > PASSWORD_MAX_LENGTH) return `Use at most ${PASSWORD_MAX_LENGTH} characters.`;
  const lower = password.normalize('NFC').toLowerCase();
  // "password password" and "p.a.s.s.w.o.r.d" are as weak as "password"
  const squeezed = lower.replace(/[\s\p{P}\p{S}]+/gu, '');
  const weak = (value: string) => isCommon(value) || isCommon(repeatedUnit(value)) || repeatedUnit(value).length <= 3;
  if (weak(lower) || (squeezed.length > 0 && weak(squeezed))) {
    return 'This password is too common or too easy to guess. Try a few unrelated words.';
  }
  const emailName = context.email?.split('@')[0]?.toLowerCase();
  if (emailName && emailName.length >= 4 && lower.includes(emailName) && lower.replace(emailName, '').length < 8) {
    return 'Do not build the password from your e-mail address.';
  }
  return null;
}
