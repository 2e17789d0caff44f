import { z } from 'zod';
import { PASSWORD_MAX_LENGTH, PASSWORD_MIN_LENGTH, passwordLength } from '../password-policy.js';
import { ROLES } from '../roles.js';
import { email } from './common.js';
import { refuseInvalidCharacters } from './text.js';

/** Sign-in fields take any password that exists; a new one follows the character rule of text. */
export const newPassword = refuseInvalidCharacters(z.string(), 'Password')
  .refine((p) => passwordLength(p) >= PASSWORD_MIN_LENGTH, `Use at least ${PASSWORD_MIN_LENGTH} characters. A few unrelated words make a long password easy to remember.`)
  .refine((p) => passwordLength(p) <= PASSWORD_MAX_LENGTH, `Use at most ${PASSWORD_MAX_LENGTH} characters.`);

export const loginBody = z
  .object({
    email,
    password: z.string().min(1, 'Enter your password.').max(1024),
  })
  .meta({ id: 'LoginBody' });
export type LoginBody = z.infer<typeof loginBody>;

export const passwordResetRequestBody = z.object({ email }).meta({ id: 'PasswordResetRequestBody' });
export type PasswordResetRequestBody = z.infer<typeof passwordResetRequestBody>;

/** A token from a link; the same character rule as text, so nothing hidden reaches a lookup or a log. */
export const linkToken = refuseInvalidCharacters(z.string(), 'Token').min(20).max(200);

export const tokenBody = z.object({ token: linkToken }).meta({ id: 'TokenBody' });
export type TokenBody = z.infer<typeof tokenBody>;

export const passwordResetCompleteBody = z
  .object({ token: linkToken, password: newPassword })
  .meta({ id: 'PasswordResetCompleteBody' });
export type PasswordResetCompleteBody = z.infer<typeof passwordResetCompleteBody>;

export const changePasswordBody = z
  .object({ currentPassword: z.string().min(1, 'Enter your current password.').max(1024), newPassword })
  .meta({ id: 'ChangePasswordBody' });
export type ChangePasswordBody = z.infer<typeof changePasswordBody>;

export const csrfTokenResponse = z.object({ csrfToken: z.string() }).meta({ id: 'CsrfToken' });
export type CsrfTokenResponse = z.infer<typeof csrfTokenResponse>;

export const sessionUser = z
  .object({
    id: z.number().int(),
    email: z.string(),
    name: z.string(),
    role: z.enum(ROLES),
    permissions: z.record(z.string(), z.array(z.string())),
  })
  .meta({ id: 'SessionUser' });
export type SessionUser = z.infer<typeof sessionUser>;

export const meResponse = z
  .object({
    user: sessionUser,
    session: z.object({ idleTimeoutMinutes: z.number(), absoluteTimeoutHours: z.number(), expiresAt: z.string() }),
  })
  .meta({ id: 'Me' });
export type MeResponse = z.infer<typeof meResponse>;

export const loginResponse = meResponse.extend({ csrfToken: z.string() }).meta({ id: 'LoginResponse' });
export type LoginResponse = z.infer<typeof loginResponse>;
