import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, type Relation } from 'typeorm';
import type { RevisionSnapshot } from '../../../shared/schemas/tours.js';
import { TourEntity } from './tour.entity.js';
import { UserEntity } from './user.entity.js';

/** Every save of a tour and its stops, kept whole so that any two can be compared and one restored. */
@Entity('tour_revisions')
@Index(['tourId', 'number'], { unique: true })
export class TourRevisionEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Column({ type: 'integer' })
  tourId: number;

  @ManyToOne(() => TourEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'tourId' })
  tour: Relation<TourEntity>;

  @Column({ type: 'integer' })
  number: number;

  @Column({ type: 'varchar', length: 300 })
  note: string;

  @Column({ type: 'simple-json' })
  snapshot: RevisionSnapshot;

  @Column({ type: 'integer', nullable: true })
  authorId: number | null;

  @ManyToOne(() => UserEntity, { nullable: true, onDelete: 'SET NULL' })
  @JoinColumn({ name: 'authorId' })
  author: Relation<UserEntity> | null;

  @CreateDateColumn({ type: 'datetime' })
  createdAt: Date;
}
