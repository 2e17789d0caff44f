import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, type Relation } from 'typeorm';
import type { PlanStatus } from '../../../shared/schemas/plans.js';
import { DeckEntity } from './deck.entity.js';

/** An uploaded deck plan and its tile pyramid. Files exist only for a plan that is `ready`. */
@Entity('plans')
export class PlanEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Index()
  @Column({ type: 'integer' })
  deckId: number;

  @ManyToOne(() => DeckEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'deckId' })
  deck: Relation<DeckEntity>;

  @Column({ type: 'varchar', length: 20 })
  status: PlanStatus;

  @Column({ type: 'varchar', length: 200 })
  originalName: string;

  @Column({ type: 'varchar', length: 40 })
  mimeType: string;

  @Column({ type: 'integer' })
  byteSize: number;

  @Column({ type: 'integer' })
  width: number;

  @Column({ type: 'integer' })
  height: number;

  @Column({ type: 'integer' })
  maxZoom: number;

  @Column({ type: 'integer' })
  tilesTotal: number;

  @Column({ type: 'integer', default: 0 })
  tilesDone: number;

  /** SHA-256 of the original file; its start goes into tile URLs. */
  @Column({ type: 'varchar', length: 64 })
  contentHash: string;

  /** Where the original and the tiles live once ready (keys of the file store). */
  @Column({ type: 'varchar', length: 200, nullable: true })
  storageKey: string | null;

  @Column({ type: 'varchar', length: 500, nullable: true })
  error: string | null;

  @Column({ type: 'integer', nullable: true })
  uploadedById: number | null;

  @CreateDateColumn({ type: 'datetime' })
  createdAt: Date;

  @Column({ type: 'datetime', nullable: true })
  finishedAt: Date | null;
}
