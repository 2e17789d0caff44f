import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn, VersionColumn, type Relation } from 'typeorm';
import type { IncidentKind } from '../../../shared/schemas/incidents.js';
import { UserEntity } from './user.entity.js';
import { VesselEntity } from './vessel.entity.js';

@Entity('incidents')
@Index(['vesselId', 'foundOn'])
export class IncidentEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Column({ type: 'integer' })
  vesselId: number;

  @ManyToOne(() => VesselEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'vesselId' })
  vessel: Relation<VesselEntity>;

  @Column({ type: 'varchar', length: 20 })
  kind: IncidentKind;

  @Column({ type: 'varchar', length: 200 })
  title: string;

  @Column({ type: 'varchar', length: 10 })
  foundOn: string;

  @Column({ type: 'varchar', length: 10, nullable: true })
  occurredOn: string | null;

  @Column({ type: 'text', default: '' })
  description: string;

  @Column({ type: 'varchar', length: 300, default: '' })
  reportedTo: string;

  @Column({ type: 'varchar', length: 100, default: '' })
  policeReference: string;

  @Column({ type: 'text', default: '' })
  actionsTaken: string;

  @Column({ type: 'simple-json' })
  closedCompartmentIds: number[];

  /** Why the closed spaces are closed, in one line the public may read. */
  @Column({ type: 'varchar', length: 200, default: '' })
  publicNote: string;

  @Column({ type: 'simple-json' })
  reportIds: number[];

  @Column({ type: 'integer', nullable: true })
  loggedById: number | null;

  @ManyToOne(() => UserEntity, { nullable: true, onDelete: 'SET NULL' })
  @JoinColumn({ name: 'loggedById' })
  loggedBy: Relation<UserEntity> | null;

  @CreateDateColumn({ type: 'datetime' })
  createdAt: Date;

  @UpdateDateColumn({ type: 'datetime' })
  updatedAt: Date;

  @VersionColumn({ type: 'integer' })
  version: number;
}
