import { Column, Entity, PrimaryColumn } from 'typeorm';

/** A Stripe event already processed; written in the same transaction as its effect. */
@Entity('stripe_events')
export class StripeEventEntity {
  @PrimaryColumn({ type: 'varchar', length: 255 })
  id: string;

  @Column({ type: 'varchar', length: 100 })
  type: string;

  @Column({ type: 'integer', nullable: true })
  donationId: number | null;

  @Column({ type: 'datetime' })
  processedAt: Date;
}
