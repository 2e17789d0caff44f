/**
 * Password length rules of NIST SP 800-63B-4 (2025), section 3.1.1.2, for a password that is the
 * only authentication factor: at least 15 characters, at least 64 allowed, no composition rules.
 * The check against common passwords runs on the server, which ships the list.
 */
export const PASSWORD_MIN_LENGTH = 15;
export const PASSWORD_MAX_LENGTH = 128;

/** Length in characters as a person counts them (code points), not UTF-16 units. */
export function passwordLength(password: string): number {
  return [...password.normalize('NFC')].length;
}
