import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, type Relation } from 'typeorm';
import { RepairProjectEntity } from './repair-project.entity.js';

/**
 * One line of a project's estimate. The quantity is an integer of thousandths of the unit
 * (2.5 m² is 2500), so a line total is integer arithmetic: no float ever meets money.
 */
@Entity('repair_project_estimate_line')
@Index(['projectId', 'position'])
export class RepairProjectEstimateLineEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Column({ type: 'integer' })
  projectId: number;

  @ManyToOne(() => RepairProjectEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'projectId' })
  project: Relation<RepairProjectEntity>;

  @Column({ type: 'integer' })
  position: number;

  @Column({ type: 'varchar', length: 300 })
  description: string;

  @Column({ type: 'integer' })
  quantityMilli: number;

  @Column({ type: 'varchar', length: 30, default: '' })
  unit: string;

  @Column({ type: 'integer' })
  unitCostCents: number;
}
