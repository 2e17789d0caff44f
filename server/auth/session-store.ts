import session from 'express-session';
import { LessThan, type DataSource } from 'typeorm';
import { SessionEntity } from '../db/entities/session.entity.js';
import { writeLock } from '../db/write-lock.js';

/**
 * express-session store on our own database. Written here because connect-typeorm's peer range
 * stops at TypeORM 0.3 and we run TypeORM 1.
 */
export class DatabaseSessionStore extends session.Store {
  private readonly pruneTimer: NodeJS.Timeout;

  constructor(private readonly dataSource: DataSource, private readonly idleMs: number) {
    super();
    this.pruneTimer = setInterval(() => void this.prune().catch(() => undefined), 10 * 60_000);
    this.pruneTimer.unref();
  }

  private get repo() {
    return this.dataSource.getRepository(SessionEntity);
  }

  private write<T>(work: () => Promise<T>): Promise<T> {
    return writeLock(this.dataSource).run(work);
  }

  private expiry(sess: session.SessionData): number {
    const expires = sess.cookie?.expires;
    return expires ? new Date(expires).getTime() : Date.now() + this.idleMs;
  }

  override get(sid: string, callback: (err: unknown, session?: session.SessionData | null) => void): void {
    this.repo
      .findOneBy({ sid })
      .then((row) => {
        if (!row || Number(row.expiresAt) <= Date.now()) return callback(null, null);
        callback(null, JSON.parse(row.data) as session.SessionData);
      })
      .catch(callback);
  }

  override set(sid: string, sess: session.SessionData, callback?: (err?: unknown) => void): void {
    this.write(() => this.repo.upsert({ sid, userId: sess.passport?.user ?? null, expiresAt: this.expiry(sess), data: JSON.stringify(sess) }, ['sid']))
      .then(() => callback?.())
      .catch((err) => callback?.(err));
  }

  override touch(sid: string, sess: session.SessionData, callback?: (err?: unknown) => void): void {
    this.write(() => this.repo.update({ sid }, { expiresAt: this.expiry(sess) }))
      .then(() => callback?.())
      .catch((err) => callback?.(err));
  }

  override destroy(sid: string, callback?: (err?: unknown) => void): void {
    this.write(() => this.repo.delete({ sid }))
      .then(() => callback?.())
      .catch((err) => callback?.(err));
  }

  /** Ends every session of a user at once (deactivation, password change). */
  async destroyForUser(userId: number, exceptSid?: string): Promise<number> {
    const qb = this.repo.createQueryBuilder().delete().where('userId = :userId', { userId });
    if (exceptSid) qb.andWhere('sid != :sid', { sid: exceptSid });
    const result = await this.write(() => qb.execute());
    return result.affected ?? 0;
  }

  async prune(): Promise<void> {
    await this.write(() => this.repo.delete({ expiresAt: LessThan(Date.now()) }));
  }

  close(): void {
    clearInterval(this.pruneTimer);
  }
}
