import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn, VersionColumn, type Relation } from 'typeorm';
import type { RichTextDoc } from '../../../shared/schemas/rich-text.js';
import type { RepairProjectStatus } from '../../../shared/schemas/repair-projects.js';
import { UserEntity } from './user.entity.js';
import { VesselEntity } from './vessel.entity.js';

/**
 * A repair the ship needs: its scope, estimate and status. `estimateCents` is the stored total of
 * the estimate lines plus contingency (shared/calc/estimate.ts), written in the same transaction
 * as the lines, so lists and appeals never add lines up on read.
 */
@Entity('repair_project')
@Index(['vesselId', 'slug'], { unique: true })
@Index(['vesselId', 'status'])
@Index(['vesselId', 'updatedAt'])
export class RepairProjectEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Column({ type: 'integer' })
  vesselId: number;

  @ManyToOne(() => VesselEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'vesselId' })
  vessel: Relation<VesselEntity>;

  @Column({ type: 'varchar', length: 200 })
  title: string;

  @Column({ type: 'varchar', length: 80 })
  slug: string;

  @Column({ type: 'varchar', length: 20, default: 'proposed' })
  status: RepairProjectStatus;

  /** The scope as tiptap JSON, and its sanitized HTML and plain text rendered at save. */
  @Column({ type: 'simple-json' })
  scope: RichTextDoc;

  @Column({ type: 'text', default: '' })
  scopeHtml: string;

  @Column({ type: 'text', default: '' })
  scopeText: string;

  @Column({ type: 'integer', default: 0 })
  estimateCents: number;

  /** Contingency in hundredths of a percent (1000 = 10 %). */
  @Column({ type: 'integer', default: 0 })
  contingencyBasisPoints: number;

  @Column({ type: 'text', default: '' })
  contractorNotes: string;

  @Column({ type: 'text', default: '' })
  permitNotes: string;

  @Column({ type: 'boolean', default: false })
  hotWork: boolean;

  @Column({ type: 'boolean', default: false })
  asbestos: boolean;

  @Column({ type: 'boolean', default: false })
  leadPaint: boolean;

  @Column({ type: 'integer', nullable: true })
  createdById: number | null;

  @ManyToOne(() => UserEntity, { nullable: true, onDelete: 'SET NULL' })
  @JoinColumn({ name: 'createdById' })
  createdBy: Relation<UserEntity> | null;

  @CreateDateColumn({ type: 'datetime' })
  createdAt: Date;

  @UpdateDateColumn({ type: 'datetime' })
  updatedAt: Date;

  @VersionColumn({ type: 'integer' })
  version: number;
}

/** The entity under its domain name, for code that refers to it so (the giving work). */
export { RepairProjectEntity as RepairProject };
