import { Entity, Index, JoinColumn, ManyToOne, PrimaryColumn, type Relation } from 'typeorm';
import { CompartmentEntity } from './compartment.entity.js';
import { RepairProjectEntity } from './repair-project.entity.js';

/** A compartment the project works in. */
@Entity('repair_project_compartment')
export class RepairProjectCompartmentEntity {
  @PrimaryColumn({ type: 'integer' })
  projectId: number;

  @ManyToOne(() => RepairProjectEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'projectId' })
  project: Relation<RepairProjectEntity>;

  @Index()
  @PrimaryColumn({ type: 'integer' })
  compartmentId: number;

  @ManyToOne(() => CompartmentEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'compartmentId' })
  target: Relation<CompartmentEntity>;
}
