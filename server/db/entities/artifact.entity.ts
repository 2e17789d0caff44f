import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn, VersionColumn, type Relation } from 'typeorm';
import type { Point } from '../../../shared/calc/geometry.js';
import type { ArtifactCategory, ArtifactStatus, DimensionUnit } from '../../../shared/schemas/artifacts.js';
import { CompartmentEntity } from './compartment.entity.js';
import { VesselEntity } from './vessel.entity.js';

@Entity('artifacts')
@Index(['vesselId', 'objectNumber'], { unique: true })
@Index(['vesselId', 'objectNumberSort'])
@Index(['vesselId', 'category'])
@Index(['vesselId', 'status'])
@Index(['vesselId', 'name'])
@Index(['vesselId', 'updatedAt'])
export class ArtifactEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Column({ type: 'integer' })
  vesselId: number;

  @ManyToOne(() => VesselEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'vesselId' })
  vessel: Relation<VesselEntity>;

  /** Trimmed and upper-cased, unique per vessel. */
  @Column({ type: 'varchar', length: 40 })
  objectNumber: string;

  /** The number with its digit runs zero-padded, for natural order. */
  @Column({ type: 'varchar', length: 120 })
  objectNumberSort: string;

  @Column({ type: 'varchar', length: 160 })
  name: string;

  @Column({ type: 'varchar', length: 40 })
  category: ArtifactCategory;

  @Column({ type: 'text', default: '' })
  description: string;

  @Column({ type: 'varchar', length: 80, default: '' })
  dateOrPeriod: string;

  @Column({ type: 'varchar', length: 200, default: '' })
  maker: string;

  @Column({ type: 'varchar', length: 400, default: '' })
  materials: string;

  @Column({ type: 'real', nullable: true })
  height: number | null;

  @Column({ type: 'real', nullable: true })
  width: number | null;

  @Column({ type: 'real', nullable: true })
  depth: number | null;

  @Column({ type: 'varchar', length: 4, default: 'cm' })
  dimensionUnit: DimensionUnit;

  @Column({ type: 'text', default: '' })
  significance: string;

  @Column({ type: 'varchar', length: 20, default: 'in-place' })
  status: ArtifactStatus;

  @Column({ type: 'text', nullable: true })
  deaccessionReason: string | null;

  @Index()
  @Column({ type: 'integer', nullable: true })
  compartmentId: number | null;

  /** A compartment holding artifacts cannot be deleted: their place would be lost. */
  @ManyToOne(() => CompartmentEntity, { nullable: true, onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'compartmentId' })
  compartment: Relation<CompartmentEntity> | null;

  /** A point on the compartment's deck plan, in plan units. */
  @Column({ type: 'simple-json', nullable: true })
  point: Point | null;

  /** The photo shown in lists (the first uploaded); kept here so that lists need no extra query. */
  @Column({ type: 'integer', nullable: true })
  coverMediaId: number | null;

  @CreateDateColumn({ type: 'datetime' })
  createdAt: Date;

  @UpdateDateColumn({ type: 'datetime' })
  updatedAt: Date;

  @VersionColumn({ type: 'integer' })
  version: number;
}
