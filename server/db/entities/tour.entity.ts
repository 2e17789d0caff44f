import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn, VersionColumn, type Relation } from 'typeorm';
import type { PublishedTour } from '../../services/tour-snapshot.js';
import type { TourAccessibility, TourAudience, TourMode, TourState } from '../../../shared/schemas/tours.js';
import { UserEntity } from './user.entity.js';
import { VesselEntity } from './vessel.entity.js';

/**
 * A tour of a vessel: its working copy (this row and its stops), and the snapshot a curator
 * published, with its HTML rendered and sanitized, which the public API serves as it is.
 */
@Entity('tours')
@Index(['vesselId', 'slug'], { unique: true })
export class TourEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Index()
  @Column({ type: 'integer' })
  vesselId: number;

  @ManyToOne(() => VesselEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'vesselId' })
  vessel: Relation<VesselEntity>;

  @Column({ type: 'varchar', length: 160 })
  title: string;

  @Column({ type: 'varchar', length: 80 })
  slug: string;

  @Column({ type: 'text', default: '' })
  summary: string;

  @Column({ type: 'varchar', length: 20, default: 'general' })
  audience: TourAudience;

  @Column({ type: 'varchar', length: 20, default: 'on-board' })
  mode: TourMode;

  @Column({ type: 'varchar', length: 20, default: 'some-stairs' })
  accessibility: TourAccessibility;

  @Column({ type: 'integer', nullable: true })
  coverMediaId: number | null;

  /** BCP 47 language tag. */
  @Column({ type: 'varchar', length: 10, default: 'en' })
  language: string;

  @Index()
  @Column({ type: 'varchar', length: 20, default: 'draft' })
  state: TourState;

  /** The number of the latest revision of the working copy. */
  @Column({ type: 'integer', default: 0 })
  revision: number;

  @Column({ type: 'simple-json', nullable: true })
  publishedSnapshot: PublishedTour | null;

  @Column({ type: 'integer', nullable: true })
  publishedRevision: number | null;

  @Column({ type: 'datetime', nullable: true })
  publishedAt: Date | null;

  @Column({ type: 'integer', nullable: true })
  submittedById: number | null;

  @ManyToOne(() => UserEntity, { nullable: true, onDelete: 'SET NULL' })
  @JoinColumn({ name: 'submittedById' })
  submittedBy: Relation<UserEntity> | null;

  @Column({ type: 'datetime', nullable: true })
  submittedAt: Date | null;

  @Column({ type: 'integer', nullable: true })
  createdById: number | null;

  @CreateDateColumn({ type: 'datetime' })
  createdAt: Date;

  @UpdateDateColumn({ type: 'datetime' })
  updatedAt: Date;

  @VersionColumn({ type: 'integer' })
  version: number;
}
