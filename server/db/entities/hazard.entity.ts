import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn, VersionColumn, type Relation } from 'typeorm';
import type { HazardKind } from '../../../shared/schemas/hazards.js';
import { CompartmentEntity } from './compartment.entity.js';
import { UserEntity } from './user.entity.js';

@Entity('hazards')
export class HazardEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Index()
  @Column({ type: 'integer' })
  compartmentId: number;

  @ManyToOne(() => CompartmentEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'compartmentId' })
  compartment: Relation<CompartmentEntity>;

  @Column({ type: 'varchar', length: 40 })
  kind: HazardKind;

  @Column({ type: 'text', default: '' })
  notes: string;

  /** Date (YYYY-MM-DD) the hazard was last checked on board. */
  @Column({ type: 'varchar', length: 10, nullable: true })
  lastVerifiedOn: string | null;

  @Column({ type: 'integer', nullable: true })
  verifiedById: number | null;

  @ManyToOne(() => UserEntity, { nullable: true, onDelete: 'SET NULL' })
  @JoinColumn({ name: 'verifiedById' })
  verifiedBy: Relation<UserEntity> | null;

  @CreateDateColumn({ type: 'datetime' })
  createdAt: Date;

  @UpdateDateColumn({ type: 'datetime' })
  updatedAt: Date;

  @VersionColumn({ type: 'integer' })
  version: number;
}
