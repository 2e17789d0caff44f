import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn, VersionColumn, type Relation } from 'typeorm';
import type { PriorityBand } from '../../../shared/calc/abc-risk.js';
import type { Agent } from '../../../shared/schemas/condition.js';
import { VesselEntity } from './vessel.entity.js';

/** A risk of the register, scored by the ABC method (shared/calc/abc-risk.ts). */
@Entity('risks')
@Index(['vesselId', 'status', 'magnitude'])
export class RiskEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Column({ type: 'integer' })
  vesselId: number;

  @ManyToOne(() => VesselEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'vesselId' })
  vessel: Relation<VesselEntity>;

  @Column({ type: 'varchar', length: 300 })
  statement: string;

  @Column({ type: 'varchar', length: 40 })
  agent: Agent;

  @Column({ type: 'varchar', length: 10, default: 'open' })
  status: 'open' | 'treated';

  @Column({ type: 'real' })
  a: number;

  @Column({ type: 'real' })
  b: number;

  @Column({ type: 'real' })
  c: number;

  /** The plain inputs a score was converted from, when it was. */
  @Column({ type: 'real', nullable: true })
  yearsBetween: number | null;

  @Column({ type: 'real', nullable: true })
  lossPerItemPercent: number | null;

  @Column({ type: 'real', nullable: true })
  assetFractionPercent: number | null;

  @Column({ type: 'real' })
  magnitude: number;

  @Column({ type: 'varchar', length: 10 })
  band: PriorityBand;

  @Column({ type: 'text', default: '' })
  notes: string;

  @CreateDateColumn({ type: 'datetime' })
  createdAt: Date;

  @UpdateDateColumn({ type: 'datetime' })
  updatedAt: Date;

  @VersionColumn({ type: 'integer' })
  version: number;
}
