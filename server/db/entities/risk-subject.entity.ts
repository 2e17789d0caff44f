import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryColumn, type Relation } from 'typeorm';
import { RiskEntity } from './risk.entity.js';

/** The compartments and artifacts a risk concerns. */
@Entity('risk_subjects')
@Index(['subjectType', 'subjectId'])
export class RiskSubjectEntity {
  @PrimaryColumn({ type: 'integer' })
  riskId: number;

  @ManyToOne(() => RiskEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'riskId' })
  risk: Relation<RiskEntity>;

  @PrimaryColumn({ type: 'varchar', length: 20 })
  subjectType: 'artifact' | 'compartment';

  @PrimaryColumn({ type: 'integer' })
  subjectId: number;

  /** The compartment's deck (or the artifact's compartment's deck when placed), for filtering by deck. */
  @Index()
  @Column({ type: 'integer', nullable: true })
  deckId: number | null;
}
