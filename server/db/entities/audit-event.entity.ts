import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, type Relation } from 'typeorm';
import type { AuditAction } from '../../../shared/schemas/audit.js';
import { UserEntity } from './user.entity.js';

export type AuditChanges = Record<string, { from: unknown; to: unknown }>;

@Entity('audit_events')
@Index(['entityType', 'entityId'])
export class AuditEventEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Index()
  @Column({ type: 'datetime' })
  at: Date;

  @Index()
  @Column({ type: 'integer', nullable: true })
  actorId: number | null;

  @ManyToOne(() => UserEntity, { nullable: true, onDelete: 'SET NULL' })
  @JoinColumn({ name: 'actorId' })
  actor: Relation<UserEntity> | null;

  @Column({ type: 'varchar', length: 30 })
  action: AuditAction;

  @Column({ type: 'varchar', length: 60 })
  entityType: string;

  @Column({ type: 'varchar', length: 60, nullable: true })
  entityId: string | null;

  @Index()
  @Column({ type: 'integer', nullable: true })
  vesselId: number | null;

  @Column({ type: 'varchar', length: 300 })
  summary: string;

  @Column({ type: 'simple-json', nullable: true })
  changes: AuditChanges | null;

  @Column({ type: 'varchar', length: 64, nullable: true })
  ipAddress: string | null;
}
