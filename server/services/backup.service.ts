import type { BackupStatus } from '../../shared/schemas/backup.js';
import { backUpAndRecord } from '../backup/backup.js';
import { createdAtOfName, listBackups } from '../backup/manifest.js';
import { nextRunAt } from '../backup/schedule.js';
import { readStatus } from '../backup/status.js';
import type { Config } from '../config.js';
import { ConflictError } from '../http/errors.js';

/** Backups taken by the server: on request of an administrator, and daily at BACKUP_HOUR. */
export class BackupService {
  private running: Promise<void> | null = null;
  private runningSince: string | null = null;
  private timer: NodeJS.Timeout | null = null;
  private nextAt: Date | null = null;

  constructor(private readonly config: Config) {}

  async status(): Promise<BackupStatus> {
    const file = await readStatus(this.config.dataDir);
    const names = await listBackups(this.config.backupDir);
    return {
      directory: this.config.backupDir,
      keep: this.config.backupKeep,
      hour: this.config.backupHour,
      nextAt: this.nextAt?.toISOString() ?? null,
      runningSince: this.runningSince,
      lastSuccess: file.lastSuccess,
      lastFailure: file.lastFailure,
      backups: names.reverse().map((name) => ({ name, createdAt: createdAtOfName(name) ?? '' })),
    };
  }

  /** Starts a backup in the background; its outcome goes to the status. */
  async start(): Promise<BackupStatus> {
    if (this.running) throw new ConflictError(`A backup is already running (since ${this.runningSince}).`);
    this.run(false);
    return this.status();
  }

  private run(log: boolean) {
    this.runningSince = new Date().toISOString();
    this.running = backUpAndRecord(this.config)
      .then((done) => {
        if (log) console.log(`Backup ${done.name} written to ${done.path} (${done.fileCount} files, ${done.sizeBytes} bytes).`);
      })
      .catch((err: unknown) => {
        console.error(`Backup failed: ${err instanceof Error ? err.message : String(err)}`);
      })
      .finally(() => {
        this.running = null;
        this.runningSince = null;
      });
  }

  /** Daily at BACKUP_HOUR, the server's local time; started by server/index.ts, not in tests. */
  schedule(): void {
    this.nextAt = nextRunAt(this.config.backupHour);
    this.timer = setTimeout(() => {
      if (!this.running) this.run(true);
      this.schedule();
    }, this.nextAt.getTime() - Date.now());
    this.timer.unref();
  }

  stop(): void {
    if (this.timer) clearTimeout(this.timer);
    this.timer = null;
    this.nextAt = null;
  }

  /** Resolves when no backup is running (tests and shutdown wait for it). */
  async idle(): Promise<void> {
    await this.running;
  }
}
