import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn, VersionColumn, type Relation } from 'typeorm';
import type { InterpretationState, InterpretationSubject, InterpretationTexts } from '../../../shared/schemas/interpretation.js';
import { UserEntity } from './user.entity.js';
import { VesselEntity } from './vessel.entity.js';

/**
 * The interpretive text of one artifact or compartment: the working draft of every audience and,
 * once a curator approved it, the published snapshot the public site serves.
 */
@Entity('interpretations')
@Index(['subjectType', 'subjectId'], { unique: true })
@Index(['vesselId', 'state'])
export class InterpretationEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Column({ type: 'integer' })
  vesselId: number;

  @ManyToOne(() => VesselEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'vesselId' })
  vessel: Relation<VesselEntity>;

  @Column({ type: 'varchar', length: 20 })
  subjectType: InterpretationSubject;

  @Column({ type: 'integer' })
  subjectId: number;

  @Column({ type: 'varchar', length: 12, default: 'draft' })
  state: InterpretationState;

  @Column({ type: 'simple-json' })
  draft: InterpretationTexts;

  @Column({ type: 'simple-json', nullable: true })
  published: InterpretationTexts | null;

  @Column({ type: 'datetime', nullable: true })
  publishedAt: Date | null;

  @Column({ type: 'integer', nullable: true })
  publishedById: number | null;

  @ManyToOne(() => UserEntity, { nullable: true, onDelete: 'SET NULL' })
  @JoinColumn({ name: 'publishedById' })
  publishedBy: Relation<UserEntity> | null;

  @Column({ type: 'datetime', nullable: true })
  submittedAt: Date | null;

  @Column({ type: 'integer', nullable: true })
  submittedById: number | null;

  @ManyToOne(() => UserEntity, { nullable: true, onDelete: 'SET NULL' })
  @JoinColumn({ name: 'submittedById' })
  submittedBy: Relation<UserEntity> | null;

  @Column({ type: 'integer', nullable: true })
  lastEditedById: number | null;

  @ManyToOne(() => UserEntity, { nullable: true, onDelete: 'SET NULL' })
  @JoinColumn({ name: 'lastEditedById' })
  lastEditedBy: Relation<UserEntity> | null;

  @Column({ type: 'text', nullable: true })
  returnComment: string | null;

  @Column({ type: 'datetime', nullable: true })
  returnedAt: Date | null;

  @Column({ type: 'integer', nullable: true })
  returnedById: number | null;

  @ManyToOne(() => UserEntity, { nullable: true, onDelete: 'SET NULL' })
  @JoinColumn({ name: 'returnedById' })
  returnedBy: Relation<UserEntity> | null;

  @CreateDateColumn({ type: 'datetime' })
  createdAt: Date;

  @UpdateDateColumn({ type: 'datetime' })
  updatedAt: Date;

  @VersionColumn({ type: 'integer' })
  version: number;
}
