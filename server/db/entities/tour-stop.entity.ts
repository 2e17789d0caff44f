import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn, VersionColumn, type Relation } from 'typeorm';
import type { Point } from '../../../shared/calc/geometry.js';
import type { RichTextDoc } from '../../../shared/schemas/rich-text.js';
import { CompartmentEntity } from './compartment.entity.js';
import { TourEntity } from './tour.entity.js';

/** One stop of a tour, in a compartment of the tour's vessel; its text is kept as JSON and as the HTML rendered at save. */
@Entity('tour_stops')
@Index(['tourId', 'position'])
export class TourStopEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Column({ type: 'integer' })
  tourId: number;

  @ManyToOne(() => TourEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'tourId' })
  tour: Relation<TourEntity>;

  /** Order in the tour, from 0. */
  @Column({ type: 'integer' })
  position: number;

  @Index()
  @Column({ type: 'integer' })
  compartmentId: number;

  @ManyToOne(() => CompartmentEntity, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'compartmentId' })
  compartment: Relation<CompartmentEntity>;

  @Column({ type: 'simple-json', default: '[]' })
  artifactIds: number[];

  @Column({ type: 'varchar', length: 160 })
  title: string;

  @Column({ type: 'simple-json' })
  textDoc: RichTextDoc;

  /** Sanitized at save (server/richtext/render.ts). */
  @Column({ type: 'text', default: '' })
  textHtml: string;

  @Column({ type: 'text', default: '' })
  textPlain: string;

  @Column({ type: 'integer', nullable: true })
  audioMediaId: number | null;

  @Column({ type: 'text', default: '' })
  transcript: string;

  @Column({ type: 'integer', default: 3 })
  dwellMinutes: number;

  @Column({ type: 'text', default: '' })
  accessNotes: string;

  @Column({ type: 'text', default: '' })
  lookFor: string;

  /** Seen from outside, with photos or a panorama; never an invitation to enter. */
  @Column({ type: 'boolean', default: false })
  virtual: boolean;

  /** Where the stop stands on the deck plan; the compartment's centre when null. */
  @Column({ type: 'simple-json', nullable: true })
  point: Point | null;

  @CreateDateColumn({ type: 'datetime' })
  createdAt: Date;

  @UpdateDateColumn({ type: 'datetime' })
  updatedAt: Date;

  @VersionColumn({ type: 'integer' })
  version: number;
}
