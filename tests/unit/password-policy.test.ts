import { describe, expect, it } from 'vitest';
import { passwordProblem } from '../../server/auth/password-policy.js';
import { newPassword } from '../../shared/schemas/auth.js';

// NIST SP 800-63B-4 (2025), 3.1.1.2: single-factor passwords at least 15 characters, at least 64
// allowed, no composition rules, refuse commonly used values.
describe('password policy', () => {
  it('refuses 14 characters and accepts 15, counting characters not bytes', () => {
    expect(passwordProblem('harbour-lamp-1')).toMatch(/at least 15/);
    expect(passwordProblem('harbour-lamp-12')).toBeNull();
    expect(passwordProblem('⚓'.repeat(14))).toMatch(/at least 15/);
    expect(newPassword.safeParse('⚓⚓⚓⚓⚓-anchors-⚓').success).toBe(true);
  });

  it('allows 64 and more characters, up to 128', () => {
    expect(passwordProblem('a long passphrase about the triple expansion engine of a ship ok!')).toBeNull();
    expect(passwordProblem('x'.repeat(20) + 'y'.repeat(100) + 'z'.repeat(8))).toBeNull();
    expect(passwordProblem('xyz'.repeat(43))).toMatch(/at most 128/);
  });

  it('has no composition rules: all lower-case words pass', () => {
    expect(passwordProblem('lantern rivet copper kettle')).toBeNull();
  });

  it('refuses common passwords, from our list and the packaged list, in any case', () => {
    expect(passwordProblem('PasswordPassword')).toMatch(/too common/);
    expect(passwordProblem('correcthorsebatterystaple')).toMatch(/too common/);
    expect(passwordProblem('1q2w3e4r5t6y7u8i9o0p')).toMatch(/too common/);
  });

  it('refuses a common password repeated to reach the length, and one repeated character', () => {
    expect(passwordProblem('dragondragondragon')).toMatch(/too common/);
    expect(passwordProblem('monkeymonkeymonkey')).toMatch(/too common/);
    expect(passwordProblem('zzzzzzzzzzzzzzzzzz')).toMatch(/too common/);
    expect(passwordProblem('abcabcabcabcabcabc')).toMatch(/too common/);
    expect(passwordProblem('password password')).toMatch(/too common/);
    expect(passwordProblem('Dragon-Dragon-Dragon')).toMatch(/too common/);
  });

  it('refuses a password built from the e-mail address', () => {
    expect(passwordProblem('rosalind.vey2026', { email: 'rosalind.vey@example.test' })).toMatch(/e-mail/);
    expect(passwordProblem('rosalind likes steam engines a lot', { email: 'rosalind@example.test' })).toBeNull();
  });
});
