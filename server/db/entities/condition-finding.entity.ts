import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn, VersionColumn, type Relation } from 'typeorm';
import type { Severity } from '../../../shared/calc/condition-grade.js';
import type { RustDistribution } from '../../../shared/calc/rust-grade.js';
import type { Agent, DamageType, FindingLocation } from '../../../shared/schemas/condition.js';
import { ArtifactEntity } from './artifact.entity.js';
import { ConditionReportEntity } from './condition-report.entity.js';

@Entity('condition_findings')
@Index(['reportId', 'position'])
export class ConditionFindingEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Column({ type: 'integer' })
  reportId: number;

  @ManyToOne(() => ConditionReportEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'reportId' })
  report: Relation<ConditionReportEntity>;

  /** The artifact concerned: the report's own, or one in the surveyed compartment. */
  @Index()
  @Column({ type: 'integer', nullable: true })
  artifactId: number | null;

  @ManyToOne(() => ArtifactEntity, { nullable: true, onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'artifactId' })
  artifact: Relation<ArtifactEntity> | null;

  @Column({ type: 'varchar', length: 40 })
  agent: Agent;

  @Column({ type: 'varchar', length: 40 })
  damageType: DamageType;

  @Column({ type: 'simple-json', nullable: true })
  location: FindingLocation | null;

  @Column({ type: 'real', nullable: true })
  extentPercent: number | null;

  @Column({ type: 'varchar', length: 10 })
  severity: Severity;

  @Column({ type: 'real', nullable: true })
  percentRusted: number | null;

  @Column({ type: 'varchar', length: 1, nullable: true })
  rustDistribution: RustDistribution | null;

  /** ASTM D610 grade written from percentRusted and the distribution, e.g. `5-G`. */
  @Column({ type: 'varchar', length: 4, nullable: true })
  rustGrade: string | null;

  @Column({ type: 'text', default: '' })
  description: string;

  @Column({ type: 'text', default: '' })
  recommendedAction: string;

  @Column({ type: 'varchar', length: 20, default: 'routine' })
  urgency: 'routine' | 'within-a-year' | 'within-a-month' | 'immediate';

  @Column({ type: 'integer', default: 0 })
  position: number;

  @CreateDateColumn({ type: 'datetime' })
  createdAt: Date;

  @UpdateDateColumn({ type: 'datetime' })
  updatedAt: Date;

  @VersionColumn({ type: 'integer' })
  version: number;
}
