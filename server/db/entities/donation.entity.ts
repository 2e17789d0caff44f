import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn, VersionColumn, type Relation } from 'typeorm';
import type { DedicationKind, DonationStatus } from '../../../shared/schemas/donations.js';
import { AppealEntity } from './appeal.entity.js';
import { VesselEntity } from './vessel.entity.js';

/** One gift through a checkout session; its state follows Stripe's, confirmed through the SDK. */
@Entity('donations')
@Index(['appealId', 'createdAt'])
@Index(['vesselId', 'createdAt'])
export class DonationEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Column({ type: 'integer' })
  vesselId: number;

  @ManyToOne(() => VesselEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'vesselId' })
  vessel: Relation<VesselEntity>;

  @Column({ type: 'integer' })
  appealId: number;

  @ManyToOne(() => AppealEntity, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'appealId' })
  appeal: Relation<AppealEntity>;

  /** Our key for the gift, sent to Stripe as client_reference_id and in metadata. */
  @Index({ unique: true })
  @Column({ type: 'varchar', length: 36 })
  reference: string;

  @Index({ unique: true })
  @Column({ type: 'varchar', length: 255 })
  checkoutSessionId: string;

  @Index()
  @Column({ type: 'varchar', length: 255, nullable: true })
  paymentIntentId: string | null;

  @Column({ type: 'integer' })
  amountCents: number;

  @Column({ type: 'varchar', length: 3 })
  currency: string;

  @Column({ type: 'varchar', length: 20 })
  status: DonationStatus;

  @Column({ type: 'integer', default: 0 })
  refundedCents: number;

  @Column({ type: 'varchar', length: 120 })
  donorName: string;

  @Column({ type: 'varchar', length: 254 })
  donorEmail: string;

  /** The donor agreed to their first name appearing among recent gifts. */
  @Column({ type: 'boolean', default: false })
  showFirstName: boolean;

  @Column({ type: 'boolean', default: true })
  anonymous: boolean;

  @Column({ type: 'varchar', length: 10, nullable: true })
  dedicationKind: DedicationKind | null;

  @Column({ type: 'varchar', length: 120, default: '' })
  dedicationName: string;

  /** Why the last attempt to pay failed, as the card network said it. */
  @Column({ type: 'varchar', length: 300, default: '' })
  failureMessage: string;

  @Column({ type: 'datetime', nullable: true })
  succeededAt: Date | null;

  @CreateDateColumn({ type: 'datetime' })
  createdAt: Date;

  @UpdateDateColumn({ type: 'datetime' })
  updatedAt: Date;

  @VersionColumn({ type: 'integer' })
  version: number;
}
