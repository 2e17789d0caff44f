import { Entity, Index, JoinColumn, ManyToOne, PrimaryColumn, type Relation } from 'typeorm';
import { ConditionFindingEntity } from './condition-finding.entity.js';
import { RepairProjectEntity } from './repair-project.entity.js';

/** A condition finding the project addresses. */
@Entity('repair_project_finding')
export class RepairProjectFindingEntity {
  @PrimaryColumn({ type: 'integer' })
  projectId: number;

  @ManyToOne(() => RepairProjectEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'projectId' })
  project: Relation<RepairProjectEntity>;

  @Index()
  @PrimaryColumn({ type: 'integer' })
  findingId: number;

  @ManyToOne(() => ConditionFindingEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'findingId' })
  target: Relation<ConditionFindingEntity>;
}
