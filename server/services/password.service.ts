import type { ChangePasswordBody, PasswordResetCompleteBody } from '../../shared/schemas/auth.js';
import type { Config } from '../config.js';
import type { Store } from '../db/store.js';
import { hashPassword, verifyPassword } from '../auth/password-hash.js';
import { passwordProblem } from '../auth/password-policy.js';
import type { DatabaseSessionStore } from '../auth/session-store.js';
import { hashToken, newToken } from '../auth/tokens.js';
import { UnprocessableError, ValidationError } from '../http/errors.js';
import type { Mailer } from '../mail/mailer.js';
import { passwordResetMail } from '../mail/templates.js';
import { recordAudit, type Actor } from './audit.service.js';

export class PasswordService {
  constructor(
    private readonly store: Store,
    private readonly mailer: Mailer,
    private readonly sessions: DatabaseSessionStore,
    private readonly config: Config,
  ) {}

  /**
   * Sends a reset link to an active account. The answer neither says nor, by waiting on the mail
   * server, shows whether the account exists: the mail goes out after the answer.
   */
  async requestReset(email: string, actor: Actor): Promise<void> {
    const user = await this.store.repos.users.findByEmail(email);
    const active = user?.status === 'active' ? user : null;
    const { token, hash } = newToken();
    const expiresAt = new Date(Date.now() + this.config.passwordResetTtlMinutes * 60_000);
    await this.store.transaction(async (repos) => {
      await recordAudit(repos, { id: null, ip: actor.ip }, {
        action: 'password-reset-request',
        entityType: 'user',
        entityId: user?.id ?? null,
        summary: `Reset link asked for ${email}${active ? '' : ' (no active account; nothing sent)'}`,
      });
      if (active) await repos.passwordResets.create({ userId: active.id, tokenHash: hash, expiresAt });
    });
    if (!active) return;
    const mail = passwordResetMail({ to: active.email, name: active.name, url: `${this.config.publicUrl}/reset-password#${token}`, expiresAt });
    void this.mailer.send(mail).catch((err: unknown) => console.error(`Password reset mail to ${active.email} failed:`, err));
  }

  async completeReset(body: PasswordResetCompleteBody, ip: string | null): Promise<void> {
    const reset = await this.store.repos.passwordResets.findByTokenHash(hashToken(body.token));
    const invalid = 'This reset link is not valid any more: it was used, replaced or has expired. Ask for a new one.';
    if (!reset || reset.usedAt || reset.expiresAt <= new Date()) throw new UnprocessableError(invalid);
    const user = await this.store.repos.users.findById(reset.userId);
    if (!user || user.status !== 'active') throw new UnprocessableError(invalid);
    const problem = passwordProblem(body.password, { email: user.email });
    if (problem) throw new ValidationError({ password: problem });
    user.passwordHash = await hashPassword(body.password, this.config.bcryptCost);
    await this.store.transaction(async (repos) => {
      await repos.users.save(user);
      await repos.passwordResets.useAllFor(user.id, new Date());
      await recordAudit(repos, { id: user.id, ip }, { action: 'password-reset', entityType: 'user', entityId: user.id, summary: `${user.email} reset their password` });
    });
    await this.sessions.destroyForUser(user.id);
  }

  async change(userId: number, body: ChangePasswordBody, currentSid: string, actor: Actor): Promise<void> {
    const user = await this.store.repos.users.findById(userId);
    if (!user || !(await verifyPassword(body.currentPassword, user.passwordHash, this.config.bcryptCost))) {
      throw new ValidationError({ currentPassword: 'This is not your current password.' });
    }
    const problem = passwordProblem(body.newPassword, { email: user.email });
    if (problem) throw new ValidationError({ newPassword: problem });
    user.passwordHash = await hashPassword(body.newPassword, this.config.bcryptCost);
    await this.store.transaction(async (repos) => {
      await repos.users.save(user);
      await repos.passwordResets.useAllFor(user.id, new Date());
      await recordAudit(repos, actor, { action: 'password-change', entityType: 'user', entityId: user.id, summary: `${user.email} changed their password` });
    });
    await this.sessions.destroyForUser(user.id, currentSid);
  }
}
