import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, type Relation } from 'typeorm';
import type { Point } from '../../../shared/calc/geometry.js';
import type { ArtifactStatus, MoveKind } from '../../../shared/schemas/artifacts.js';
import { ArtifactEntity } from './artifact.entity.js';
import { UserEntity } from './user.entity.js';

/**
 * One entry of an artifact's location history. Places are kept as written at the time (id and
 * label), so the history still reads after a compartment is renamed.
 */
@Entity('artifact_moves')
@Index(['artifactId', 'movedOn'])
export class ArtifactMoveEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Column({ type: 'integer' })
  artifactId: number;

  @ManyToOne(() => ArtifactEntity, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'artifactId' })
  artifact: Relation<ArtifactEntity>;

  @Column({ type: 'varchar', length: 20 })
  kind: MoveKind;

  /** Date of the move (YYYY-MM-DD), which may be earlier than the day it was recorded. */
  @Column({ type: 'varchar', length: 10 })
  movedOn: string;

  @Column({ type: 'varchar', length: 20, nullable: true })
  fromStatus: ArtifactStatus | null;

  @Column({ type: 'integer', nullable: true })
  fromCompartmentId: number | null;

  @Column({ type: 'varchar', length: 200, nullable: true })
  fromLabel: string | null;

  @Column({ type: 'simple-json', nullable: true })
  fromPoint: Point | null;

  @Column({ type: 'varchar', length: 20 })
  toStatus: ArtifactStatus;

  @Column({ type: 'integer', nullable: true })
  toCompartmentId: number | null;

  @Column({ type: 'varchar', length: 200, nullable: true })
  toLabel: string | null;

  @Column({ type: 'simple-json', nullable: true })
  toPoint: Point | null;

  @Column({ type: 'text' })
  reason: string;

  @Column({ type: 'integer', nullable: true })
  actorId: number | null;

  @ManyToOne(() => UserEntity, { nullable: true, onDelete: 'SET NULL' })
  @JoinColumn({ name: 'actorId' })
  actor: Relation<UserEntity> | null;

  @CreateDateColumn({ type: 'datetime' })
  createdAt: Date;
}
