import { Column, Entity, PrimaryColumn } from 'typeorm';

/** An appeal's ledger for one calendar month (UTC) of the gifts' dates, kept beside the appeal's totals. */
@Entity('appeal_month_totals')
export class AppealMonthTotalEntity {
  @PrimaryColumn({ type: 'integer' })
  appealId: number;

  /** YYYY-MM */
  @PrimaryColumn({ type: 'varchar', length: 7 })
  month: string;

  @Column({ type: 'integer', default: 0 })
  raisedCents: number;

  @Column({ type: 'integer', default: 0 })
  refundedCents: number;

  @Column({ type: 'integer', default: 0 })
  giftCount: number;
}
