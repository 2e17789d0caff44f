import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn, VersionColumn, type Relation } from 'typeorm';
import type { RichTextDoc } from '../../../shared/schemas/rich-text.js';
import { RepairProjectEntity } from './repair-project.entity.js';
import { VesselEntity } from './vessel.entity.js';

export interface AppealPhoto {
  mediaId: number;
  altText: string;
  caption: string;
}

/**
 * The public appeal of one repair project. The ledger's totals live here and change in the same
 * transaction as each donation's change (services/giving-ledger.ts), so the page never sums gifts.
 */
@Entity('appeals')
export class AppealEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Column({ type: 'integer' })
  vesselId: number;

  @ManyToOne(() => VesselEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'vesselId' })
  vessel: Relation<VesselEntity>;

  @Index({ unique: true })
  @Column({ type: 'integer' })
  repairProjectId: number;

  @ManyToOne(() => RepairProjectEntity, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'repairProjectId' })
  repairProject: Relation<RepairProjectEntity>;

  @Column({ type: 'simple-json', nullable: true })
  storyDoc: RichTextDoc | null;

  /** Sanitized at save by server/richtext/render.ts; the public API serves only this. */
  @Column({ type: 'text', default: '' })
  storyHtml: string;

  @Column({ type: 'text', default: '' })
  storyText: string;

  @Column({ type: 'integer' })
  goalCents: number;

  @Column({ type: 'simple-json' })
  photos: AppealPhoto[];

  @Column({ type: 'datetime', nullable: true })
  publishedAt: Date | null;

  /** Gross of succeeded gifts, refunds so far, and gifts not wholly refunded. */
  @Column({ type: 'integer', default: 0 })
  raisedCents: number;

  @Column({ type: 'integer', default: 0 })
  refundedCents: number;

  @Column({ type: 'integer', default: 0 })
  giftCount: number;

  @CreateDateColumn({ type: 'datetime' })
  createdAt: Date;

  @UpdateDateColumn({ type: 'datetime' })
  updatedAt: Date;

  @VersionColumn({ type: 'integer' })
  version: number;
}
