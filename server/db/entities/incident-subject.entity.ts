import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryColumn, type Relation } from 'typeorm';
import { IncidentEntity } from './incident.entity.js';

/** What an incident affected: artifacts and compartments (looked up both ways, for histories). */
@Entity('incident_subjects')
@Index(['subjectType', 'subjectId'])
export class IncidentSubjectEntity {
  @PrimaryColumn({ type: 'integer' })
  incidentId: number;

  @ManyToOne(() => IncidentEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'incidentId' })
  incident: Relation<IncidentEntity>;

  @PrimaryColumn({ type: 'varchar', length: 20 })
  subjectType: 'artifact' | 'compartment';

  @PrimaryColumn({ type: 'integer' })
  subjectId: number;
}
