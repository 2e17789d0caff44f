import { Entity, Index, JoinColumn, ManyToOne, PrimaryColumn, type Relation } from 'typeorm';
import { RiskEntity } from './risk.entity.js';
import { RepairProjectEntity } from './repair-project.entity.js';

/** A risk of the register the project treats. */
@Entity('repair_project_risk')
export class RepairProjectRiskEntity {
  @PrimaryColumn({ type: 'integer' })
  projectId: number;

  @ManyToOne(() => RepairProjectEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'projectId' })
  project: Relation<RepairProjectEntity>;

  @Index()
  @PrimaryColumn({ type: 'integer' })
  riskId: number;

  @ManyToOne(() => RiskEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'riskId' })
  target: Relation<RiskEntity>;
}
