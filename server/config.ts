import { randomBytes } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';

export interface MailConfig {
  /** Host of a real SMTP server; when empty the local fake mail server is started. */
  host: string | null;
  port: number;
  secure: boolean;
  user: string | null;
  password: string | null;
  from: string;
}

export interface StripeConfig {
  /** A real Stripe secret key; when empty the SDK talks to the local fake of the Stripe API. */
  secretKey: string | null;
  /** The endpoint's signing secret; with the fake, its fixed one when unset. */
  webhookSecret: string | null;
  /** Port for the local Stripe fake (any free port if taken). */
  fakePort: number;
}

export interface Config {
  env: 'development' | 'production' | 'test';
  port: number;
  host: string;
  dataDir: string;
  uploadsDir: string;
  databasePath: string;
  publicUrl: string;
  sessionSecret: string;
  sessionIdleMinutes: number;
  sessionAbsoluteHours: number;
  secureCookies: boolean;
  trustProxy: boolean;
  bcryptCost: number;
  invitationTtlHours: number;
  passwordResetTtlMinutes: number;
  loginLimitPerAccount: number;
  loginLimitPerAddress: number;
  loginWindowMinutes: number;
  csrfLimitPerMinute: number;
  mail: MailConfig;
  /** Port for the local fake mail server (0 picks a free one). */
  fakeMailPort: number;
  stripe: StripeConfig;
  clientDir: string;
  seedOnStart: boolean;
  /** Largest deck plan accepted, in bytes and in pixels a side. */
  planMaxBytes: number;
  planMaxSide: number;
  /** Largest photo or document accepted, in bytes. */
  mediaMaxBytes: number;
  /** Where backups go, the hour of the daily one (server's local time, 0–23) and how many are kept. */
  backupDir: string;
  backupHour: number;
  backupKeep: number;
}

function int(value: string | undefined, fallback: number, name: string): number {
  if (value === undefined || value === '') return fallback;
  const n = Number(value);
  if (!Number.isInteger(n) || n < 0) throw new Error(`${name} must be a whole number, got "${value}".`);
  return n;
}

function between(value: number, min: number, max: number, name: string): number {
  if (value < min || value > max) throw new Error(`${name} must be from ${min} to ${max}, got ${value}.`);
  return value;
}

function bool(value: string | undefined, fallback: boolean): boolean {
  if (value === undefined || value === '') return fallback;
  return ['1', 'true', 'yes', 'on'].includes(value.toLowerCase());
}

/** The session secret from the environment, or one generated once and kept in the data folder. */
function sessionSecret(env: NodeJS.ProcessEnv, dataDir: string): string {
  if (env.SESSION_SECRET) return env.SESSION_SECRET;
  const file = path.join(dataDir, 'session-secret');
  if (existsSync(file)) return readFileSync(file, 'utf8').trim();
  const secret = randomBytes(48).toString('base64url');
  writeFileSync(file, secret, { mode: 0o600 });
  return secret;
}

export function loadConfig(env: NodeJS.ProcessEnv = process.env, overrides: Partial<Config> = {}): Config {
  const nodeEnv = env.NODE_ENV === 'production' ? 'production' : env.NODE_ENV === 'test' ? 'test' : 'development';
  const dataDir = path.resolve(overrides.dataDir ?? env.DATA_DIR ?? './data');
  const uploadsDir = path.resolve(overrides.uploadsDir ?? env.UPLOADS_DIR ?? './uploads');
  mkdirSync(dataDir, { recursive: true });
  mkdirSync(uploadsDir, { recursive: true });
  const port = int(env.PORT, 3000, 'PORT');
  const publicUrl = (env.PUBLIC_URL ?? `http://localhost:${port}`).replace(/\/$/, '');
  const config: Config = {
    env: nodeEnv,
    port,
    host: env.HOST ?? '0.0.0.0',
    dataDir,
    uploadsDir,
    databasePath: path.join(dataDir, 'shipkeeper.sqlite'),
    publicUrl,
    sessionSecret: overrides.sessionSecret ?? sessionSecret(env, dataDir),
    sessionIdleMinutes: int(env.SESSION_IDLE_MINUTES, 30, 'SESSION_IDLE_MINUTES'),
    sessionAbsoluteHours: int(env.SESSION_ABSOLUTE_HOURS, 12, 'SESSION_ABSOLUTE_HOURS'),
    secureCookies: bool(env.SECURE_COOKIES, publicUrl.startsWith('https://')),
    trustProxy: bool(env.TRUST_PROXY, false),
    bcryptCost: int(env.BCRYPT_COST, 12, 'BCRYPT_COST'),
    invitationTtlHours: int(env.INVITATION_TTL_HOURS, 72, 'INVITATION_TTL_HOURS'),
    passwordResetTtlMinutes: int(env.PASSWORD_RESET_TTL_MINUTES, 60, 'PASSWORD_RESET_TTL_MINUTES'),
    loginLimitPerAccount: int(env.LOGIN_LIMIT_PER_ACCOUNT, 5, 'LOGIN_LIMIT_PER_ACCOUNT'),
    loginLimitPerAddress: int(env.LOGIN_LIMIT_PER_ADDRESS, 30, 'LOGIN_LIMIT_PER_ADDRESS'),
    loginWindowMinutes: int(env.LOGIN_WINDOW_MINUTES, 15, 'LOGIN_WINDOW_MINUTES'),
    csrfLimitPerMinute: int(env.CSRF_LIMIT_PER_MINUTE, 60, 'CSRF_LIMIT_PER_MINUTE'),
    mail: {
      host: env.SMTP_HOST || null,
      port: int(env.SMTP_PORT, 587, 'SMTP_PORT'),
      secure: bool(env.SMTP_SECURE, false),
      user: env.SMTP_USER || null,
      password: env.SMTP_PASSWORD || null,
      from: env.MAIL_FROM ?? 'Shipkeeper <no-reply@shipkeeper.test>',
    },
    fakeMailPort: int(env.FAKE_SMTP_PORT, 2525, 'FAKE_SMTP_PORT'),
    stripe: {
      secretKey: env.STRIPE_SECRET_KEY || null,
      webhookSecret: env.STRIPE_WEBHOOK_SECRET || null,
      fakePort: int(env.STRIPE_FAKE_PORT, 12111, 'STRIPE_FAKE_PORT'),
    },
    clientDir: path.resolve(env.CLIENT_DIR ?? './dist'),
    seedOnStart: bool(env.SEED_ON_START, nodeEnv !== 'production'),
    planMaxBytes: int(env.PLAN_MAX_MB, 300, 'PLAN_MAX_MB') * 1024 * 1024,
    planMaxSide: int(env.PLAN_MAX_SIDE, 40_000, 'PLAN_MAX_SIDE'),
    mediaMaxBytes: int(env.MEDIA_MAX_MB, 50, 'MEDIA_MAX_MB') * 1024 * 1024,
    backupDir: path.resolve(overrides.backupDir ?? env.BACKUP_DIR ?? path.join(dataDir, 'backups')),
    backupHour: between(int(env.BACKUP_HOUR, 3, 'BACKUP_HOUR'), 0, 23, 'BACKUP_HOUR'),
    backupKeep: between(int(env.BACKUP_KEEP, 14, 'BACKUP_KEEP'), 1, 10_000, 'BACKUP_KEEP'),
  };
  return { ...config, ...overrides };
}
