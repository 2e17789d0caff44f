import { Entity, Index, JoinColumn, ManyToOne, PrimaryColumn, type Relation } from 'typeorm';
import { ConditionFindingEntity } from './condition-finding.entity.js';
import { TreatmentEntity } from './treatment.entity.js';

/** A finding a treatment addresses; the finding itself is never edited. */
@Entity('treatment_finding')
export class TreatmentFindingEntity {
  @PrimaryColumn({ type: 'integer' })
  treatmentId: number;

  @ManyToOne(() => TreatmentEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'treatmentId' })
  treatment: Relation<TreatmentEntity>;

  @Index()
  @PrimaryColumn({ type: 'integer' })
  findingId: number;

  @ManyToOne(() => ConditionFindingEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'findingId' })
  finding: Relation<ConditionFindingEntity>;
}
