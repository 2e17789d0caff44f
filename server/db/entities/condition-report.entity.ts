import type { SurveyMethod } from '../../../shared/schemas/condition.js';
import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn, VersionColumn, type Relation } from 'typeorm';
import type { ConditionGrade } from '../../../shared/calc/condition-grade.js';
import type { ReportSubject } from '../../../shared/schemas/condition.js';
import { UserEntity } from './user.entity.js';
import { VesselEntity } from './vessel.entity.js';

/**
 * A condition report on an artifact or a compartment. A draft may change; once submitted it is
 * signed and never changes again: an amendment is a new revision that supersedes it.
 */
@Entity('condition_reports')
@Index(['subjectType', 'subjectId', 'status', 'inspectedOn'])
@Index(['vesselId', 'inspectedOn'])
export class ConditionReportEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Column({ type: 'integer' })
  vesselId: number;

  @ManyToOne(() => VesselEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'vesselId' })
  vessel: Relation<VesselEntity>;

  @Column({ type: 'varchar', length: 20 })
  subjectType: ReportSubject;

  @Column({ type: 'integer' })
  subjectId: number;

  /** 1 for the first report, +1 for each amendment. */
  @Column({ type: 'integer', default: 1 })
  revision: number;

  @Index()
  @Column({ type: 'integer', nullable: true })
  supersedesId: number | null;

  @ManyToOne(() => ConditionReportEntity, { nullable: true, onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'supersedesId' })
  supersedes: Relation<ConditionReportEntity> | null;

  @Column({ type: 'varchar', length: 10, default: 'draft' })
  status: 'draft' | 'submitted';

  @Column({ type: 'varchar', length: 10 })
  inspectedOn: string;

  @Column({ type: 'integer', nullable: true })
  surveyorId: number | null;

  @ManyToOne(() => UserEntity, { nullable: true, onDelete: 'SET NULL' })
  @JoinColumn({ name: 'surveyorId' })
  surveyor: Relation<UserEntity> | null;

  @Column({ type: 'varchar', length: 30, default: 'visual' })
  method: SurveyMethod;

  @Column({ type: 'real', nullable: true })
  temperatureC: number | null;

  @Column({ type: 'real', nullable: true })
  relativeHumidity: number | null;

  @Column({ type: 'text', default: '' })
  summary: string;

  /** The grade the rule gives from the findings; kept current on every change of a draft. */
  @Column({ type: 'varchar', length: 10, default: 'good' })
  computedGrade: ConditionGrade;

  @Column({ type: 'varchar', length: 10, nullable: true })
  gradeOverride: ConditionGrade | null;

  @Column({ type: 'text', nullable: true })
  overrideReason: string | null;

  /** The grade that counts: the override when given, else the computed one. */
  @Column({ type: 'varchar', length: 10, default: 'good' })
  grade: ConditionGrade;

  @Column({ type: 'integer', default: 0 })
  findingCount: number;

  @Column({ type: 'datetime', nullable: true })
  submittedAt: Date | null;

  /** The signer's name as it was at submission. */
  @Column({ type: 'varchar', length: 120, nullable: true })
  signedBy: string | null;

  @CreateDateColumn({ type: 'datetime' })
  createdAt: Date;

  @UpdateDateColumn({ type: 'datetime' })
  updatedAt: Date;

  @VersionColumn({ type: 'integer' })
  version: number;
}
