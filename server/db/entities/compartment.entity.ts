import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn, VersionColumn, type Relation } from 'typeorm';
import type { Point } from '../../../shared/calc/geometry.js';
import type { AccessStatus } from '../../../shared/schemas/compartments.js';
import { DeckEntity } from './deck.entity.js';
import { VesselEntity } from './vessel.entity.js';

@Entity('compartments')
@Index(['vesselId', 'designationKey'], { unique: true })
export class CompartmentEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Index()
  @Column({ type: 'integer' })
  vesselId: number;

  @ManyToOne(() => VesselEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'vesselId' })
  vessel: Relation<VesselEntity>;

  @Index()
  @Column({ type: 'integer' })
  deckId: number;

  @ManyToOne(() => DeckEntity, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'deckId' })
  deck: Relation<DeckEntity>;

  @Column({ type: 'varchar', length: 40 })
  designation: string;

  /** The designation upper-cased and trimmed, unique per vessel. */
  @Column({ type: 'varchar', length: 40 })
  designationKey: string;

  @Column({ type: 'varchar', length: 120 })
  name: string;

  @Column({ type: 'text', default: '' })
  description: string;

  @Column({ type: 'varchar', length: 20, default: 'staff-only' })
  accessStatus: AccessStatus;

  @Column({ type: 'boolean', default: false })
  virtualVisit: boolean;

  /** Outline in plan units of the deck's current plan; null until drawn. */
  @Column({ type: 'simple-json', nullable: true })
  outline: Point[] | null;

  @CreateDateColumn({ type: 'datetime' })
  createdAt: Date;

  @UpdateDateColumn({ type: 'datetime' })
  updatedAt: Date;

  @VersionColumn({ type: 'integer' })
  version: number;
}
