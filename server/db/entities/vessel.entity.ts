import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn, UpdateDateColumn, VersionColumn } from 'typeorm';
import type { DesignationScheme } from '../../../shared/schemas/vessels.js';

@Entity('vessels')
export class VesselEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Column({ type: 'varchar', length: 120 })
  name: string;

  @Column({ type: 'varchar', length: 120 })
  vesselType: string;

  @Column({ type: 'integer', nullable: true })
  builtYear: number | null;

  @Column({ type: 'varchar', length: 200, default: '' })
  berth: string;

  @Column({ type: 'text', default: '' })
  summary: string;

  @Column({ type: 'varchar', length: 30, default: 'free-text' })
  designationScheme: DesignationScheme;

  @Column({ type: 'datetime', nullable: true })
  archivedAt: Date | null;

  @CreateDateColumn({ type: 'datetime' })
  createdAt: Date;

  @UpdateDateColumn({ type: 'datetime' })
  updatedAt: Date;

  @VersionColumn({ type: 'integer' })
  version: number;
}
