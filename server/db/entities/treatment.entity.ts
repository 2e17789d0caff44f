import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn, VersionColumn, type Relation } from 'typeorm';
import { RepairProjectEntity } from './repair-project.entity.js';
import { UserEntity } from './user.entity.js';
import { VesselEntity } from './vessel.entity.js';

/**
 * Work done under a repair project: when, by whom (a user of ours or a named contractor), the
 * method and materials. Its before and after photos are media owned by the treatment.
 */
@Entity('treatment')
@Index(['projectId', 'performedOn'])
export class TreatmentEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Index()
  @Column({ type: 'integer' })
  vesselId: number;

  @ManyToOne(() => VesselEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'vesselId' })
  vessel: Relation<VesselEntity>;

  @Column({ type: 'integer' })
  projectId: number;

  @ManyToOne(() => RepairProjectEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'projectId' })
  project: Relation<RepairProjectEntity>;

  /** ISO date (YYYY-MM-DD) the work was done. */
  @Column({ type: 'varchar', length: 10 })
  performedOn: string;

  @Column({ type: 'integer', nullable: true })
  performedById: number | null;

  @ManyToOne(() => UserEntity, { nullable: true, onDelete: 'SET NULL' })
  @JoinColumn({ name: 'performedById' })
  performedBy: Relation<UserEntity> | null;

  /** A contractor named instead of a user. */
  @Column({ type: 'varchar', length: 200, default: '' })
  contractorName: string;

  @Column({ type: 'text', default: '' })
  method: string;

  @Column({ type: 'text', default: '' })
  materials: string;

  @CreateDateColumn({ type: 'datetime' })
  createdAt: Date;

  @UpdateDateColumn({ type: 'datetime' })
  updatedAt: Date;

  @VersionColumn({ type: 'integer' })
  version: number;
}
