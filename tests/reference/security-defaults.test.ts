import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { loadConfig } from '../../server/config.js';
import { PASSWORD_MAX_LENGTH, PASSWORD_MIN_LENGTH } from '../../shared/password-policy.js';

const dir = mkdtempSync(path.join(tmpdir(), 'shipkeeper-ref-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe('security defaults against their published sources', () => {
  const config = loadConfig({}, { dataDir: dir, uploadsDir: path.join(dir, 'uploads') });

  it('sessions: 30 minutes idle and 12 hours absolute', () => {
    // OWASP ASVS 4.0.3, requirement 3.3.2 (level 2): re-authenticate after 12 hours or 30 minutes of inactivity.
    expect(config.sessionIdleMinutes).toBe(30);
    expect(config.sessionAbsoluteHours).toBe(12);
  });

  it('passwords: at least 15 characters, at least 64 allowed', () => {
    // NIST SP 800-63B-4 (2025), 3.1.1.2: minimum 15 for a single-factor password; maximum at least 64.
    expect(PASSWORD_MIN_LENGTH).toBe(15);
    expect(PASSWORD_MAX_LENGTH).toBeGreaterThanOrEqual(64);
  });

  it('a session secret is generated once and kept', () => {
    const again = loadConfig({}, { dataDir: dir, uploadsDir: path.join(dir, 'uploads') });
    expect(again.sessionSecret).toBe(config.sessionSecret);
    expect(config.sessionSecret.length).toBeGreaterThanOrEqual(48);
  });
});
