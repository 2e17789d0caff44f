import type { DataSource } from 'typeorm';
import type { HealthResponse } from '../../shared/schemas/health.js';
import { databaseState } from '../db/database-state.js';
import type { FakeMailServer } from '../fakes/mail-server.js';

export class HealthService {
  constructor(private readonly dataSource: DataSource, private readonly fakeMail: FakeMailServer | null, private readonly version: string) {}

  async check(): Promise<HealthResponse> {
    let database: HealthResponse['database'];
    try {
      const state = await databaseState(this.dataSource);
      database = { status: 'ok', pendingMigrations: state.pendingMigrations ? 1 : 0, journalMode: state.journalMode };
    } catch {
      database = { status: 'error', pendingMigrations: 0, journalMode: 'unknown' };
    }
    return {
      status: database.status === 'ok' && database.pendingMigrations === 0 ? 'ok' : 'degraded',
      version: this.version,
      database,
      fakes: { mail: { running: this.fakeMail?.running ?? false, port: this.fakeMail?.port ?? null } },
    };
  }
}
