import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, type Relation } from 'typeorm';
import type { RepairProjectStatus } from '../../../shared/schemas/repair-projects.js';
import { RepairProjectEntity } from './repair-project.entity.js';
import { UserEntity } from './user.entity.js';

/** A dated change of a project's status and who made it; `fromStatus` is null for the proposal. */
@Entity('repair_project_status_change')
@Index(['projectId', 'at'])
export class RepairProjectStatusChangeEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Column({ type: 'integer' })
  projectId: number;

  @ManyToOne(() => RepairProjectEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'projectId' })
  project: Relation<RepairProjectEntity>;

  @Column({ type: 'varchar', length: 20, nullable: true })
  fromStatus: RepairProjectStatus | null;

  @Column({ type: 'varchar', length: 20 })
  toStatus: RepairProjectStatus;

  @Column({ type: 'datetime' })
  at: Date;

  @Column({ type: 'integer', nullable: true })
  byUserId: number | null;

  @ManyToOne(() => UserEntity, { nullable: true, onDelete: 'SET NULL' })
  @JoinColumn({ name: 'byUserId' })
  byUser: Relation<UserEntity> | null;

  @Column({ type: 'text', default: '' })
  note: string;
}
