import { Column, Entity, Index, PrimaryColumn } from 'typeorm';

/** A signed-in or anonymous browser session, kept in the database so a restart keeps it. */
@Entity('sessions')
export class SessionEntity {
  @PrimaryColumn({ type: 'varchar', length: 128 })
  sid: string;

  @Index()
  @Column({ type: 'integer', nullable: true })
  userId: number | null;

  /** Epoch milliseconds; expired rows are pruned. */
  @Index()
  @Column({ type: 'bigint' })
  expiresAt: number;

  @Column({ type: 'text' })
  data: string;
}
