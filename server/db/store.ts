import type { DataSource, EntityManager } from 'typeorm';
import { AuditEventRepository } from './repositories/audit-event.repository.js';
import { InvitationRepository } from './repositories/invitation.repository.js';
import { PasswordResetRepository } from './repositories/password-reset.repository.js';
import { SettingsRepository } from './repositories/settings.repository.js';
import { UserRepository } from './repositories/user.repository.js';
import { VesselRepository } from './repositories/vessel.repository.js';

export interface Repositories {
  users: UserRepository;
  invitations: InvitationRepository;
  passwordResets: PasswordResetRepository;
  vessels: VesselRepository;
  auditEvents: AuditEventRepository;
  settings: SettingsRepository;
}

function repositories(manager: EntityManager): Repositories {
  return {
    users: new UserRepository(manager),
    invitations: new InvitationRepository(manager),
    passwordResets: new PasswordResetRepository(manager),
    vessels: new VesselRepository(manager),
    auditEvents: new AuditEventRepository(manager),
    settings: new SettingsRepository(manager),
  };
}

/** Repositories outside a transaction, and a way to run a change in one. */
export class Store {
  readonly repos: Repositories;

  constructor(readonly dataSource: DataSource) {
    this.repos = repositories(dataSource.manager);
  }

  transaction<T>(work: (repos: Repositories) => Promise<T>): Promise<T> {
    return this.dataSource.transaction((manager) => work(repositories(manager)));
  }
}
