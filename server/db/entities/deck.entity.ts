import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn, VersionColumn, type Relation } from 'typeorm';
import type { Point } from '../../../shared/calc/geometry.js';
import { VesselEntity } from './vessel.entity.js';

/** How a deck's scale was set, kept so it can be shown and redone. */
export interface DeckCalibrationRecord {
  method: 'points' | 'frames';
  a: Point;
  b: Point;
  realMetres: number;
  frameSpaces?: number;
  frameSpacingMetres?: number;
}

/** How the plan's frames are numbered: one frame's x on the plan, the spacing, and the last frame drawn. */
export interface DeckFramesRecord {
  referenceFrame: number;
  referenceX: number;
  spacingMetres: number;
  lastFrame: number;
}

@Entity('decks')
@Index(['vesselId', 'position'])
export class DeckEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Column({ type: 'integer' })
  vesselId: number;

  @ManyToOne(() => VesselEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'vesselId' })
  vessel: Relation<VesselEntity>;

  @Column({ type: 'varchar', length: 80 })
  name: string;

  /** Order from the top of the ship down (0 first). */
  @Column({ type: 'integer' })
  position: number;

  /** The deck as designations write it (1 main deck, 2, 3… below, 01, 02… above), if known. */
  @Column({ type: 'varchar', length: 3, nullable: true })
  levelCode: string | null;

  @Column({ type: 'integer', nullable: true })
  currentPlanId: number | null;

  /** Size in pixels of the current plan: the coordinate space of outlines and calibration. */
  @Column({ type: 'integer', nullable: true })
  planWidth: number | null;

  @Column({ type: 'integer', nullable: true })
  planHeight: number | null;

  @Column({ type: 'real', nullable: true })
  metresPerUnit: number | null;

  @Column({ type: 'simple-json', nullable: true })
  calibration: DeckCalibrationRecord | null;

  /** Plan y-coordinate of the centerline, when set. */
  @Column({ type: 'real', nullable: true })
  centerlineY: number | null;

  @Column({ type: 'simple-json', nullable: true })
  frames: DeckFramesRecord | null;

  /** Which way the bow points on the plan; with the centerline it tells port from starboard. */
  @Column({ type: 'varchar', length: 5, default: 'right' })
  bowTo: 'right' | 'left';

  @CreateDateColumn({ type: 'datetime' })
  createdAt: Date;

  @UpdateDateColumn({ type: 'datetime' })
  updatedAt: Date;

  @VersionColumn({ type: 'integer' })
  version: number;
}
