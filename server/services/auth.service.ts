import { permissionsFor } from '../../shared/permissions.js';
import type { MeResponse, SessionUser } from '../../shared/schemas/auth.js';
import type { Config } from '../config.js';
import type { Store } from '../db/store.js';
import { verifyPassword } from '../auth/password-hash.js';
import { recordAudit, type Actor } from './audit.service.js';

export class AuthService {
  constructor(private readonly store: Store, private readonly config: Config) {}

  /** The user if the e-mail and password match an active account; null otherwise (one answer for every failure). */
  async verifyCredentials(email: string, password: string): Promise<Express.User | null> {
    const user = await this.store.repos.users.findByEmail(email);
    const ok = await verifyPassword(password, user?.status === 'active' ? user.passwordHash : null, this.config.bcryptCost);
    if (!ok || !user) return null;
    return { id: user.id, email: user.email, name: user.name, role: user.role };
  }

  /** Loads the session's user; null ends the session (deactivated or removed). */
  async sessionUser(id: number): Promise<Express.User | null> {
    const user = await this.store.repos.users.findById(id);
    if (!user || user.status !== 'active') return null;
    return { id: user.id, email: user.email, name: user.name, role: user.role };
  }

  async recordSignIn(user: Express.User, actor: Actor): Promise<void> {
    await this.store.transaction(async (repos) => {
      await repos.users.touchSignIn(user.id, new Date());
      await recordAudit(repos, { ...actor, id: user.id }, { action: 'sign-in', entityType: 'user', entityId: user.id, summary: `${user.email} signed in` });
    });
  }

  /** A refused sign-in, so that an administrator can see guessing in the audit trail. */
  async recordFailedSignIn(email: string, actor: Actor): Promise<void> {
    const user = await this.store.repos.users.findByEmail(email);
    await this.store.transaction((repos) =>
      recordAudit(repos, { id: null, ip: actor.ip }, { action: 'sign-in-failed', entityType: 'user', entityId: user?.id ?? null, summary: `Sign-in refused for ${email}` }),
    );
  }

  async recordSignOut(user: Express.User, actor: Actor): Promise<void> {
    await this.store.transaction((repos) =>
      recordAudit(repos, actor, { action: 'sign-out', entityType: 'user', entityId: user.id, summary: `${user.email} signed out` }),
    );
  }

  me(user: Express.User, cookieExpires: Date | undefined): MeResponse {
    const sessionUser: SessionUser = { ...user, permissions: permissionsFor(user.role) };
    return {
      user: sessionUser,
      session: {
        idleTimeoutMinutes: this.config.sessionIdleMinutes,
        absoluteTimeoutHours: this.config.sessionAbsoluteHours,
        expiresAt: (cookieExpires ?? new Date(Date.now() + this.config.sessionIdleMinutes * 60_000)).toISOString(),
      },
    };
  }
}
