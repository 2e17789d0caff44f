import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, type Relation } from 'typeorm';
import { TourEntity } from './tour.entity.js';
import { UserEntity } from './user.entity.js';

/** A review comment on a tour or one of its stops, made on a revision. */
@Entity('tour_comments')
export class TourCommentEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Index()
  @Column({ type: 'integer' })
  tourId: number;

  @ManyToOne(() => TourEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'tourId' })
  tour: Relation<TourEntity>;

  /** The stop commented on (null: the whole tour); kept as a number if the stop goes. */
  @Column({ type: 'integer', nullable: true })
  stopId: number | null;

  @Column({ type: 'text' })
  body: string;

  @Column({ type: 'integer' })
  revision: number;

  @Column({ type: 'integer', nullable: true })
  authorId: number | null;

  @ManyToOne(() => UserEntity, { nullable: true, onDelete: 'SET NULL' })
  @JoinColumn({ name: 'authorId' })
  author: Relation<UserEntity> | null;

  @CreateDateColumn({ type: 'datetime' })
  createdAt: Date;
}
