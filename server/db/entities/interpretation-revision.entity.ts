import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, type Relation } from 'typeorm';
import type { InterpretationTexts } from '../../../shared/schemas/interpretation.js';
import { InterpretationEntity } from './interpretation.entity.js';
import { UserEntity } from './user.entity.js';

/** One save of an interpretation's draft, kept as it was; numbered 1, 2, 3… per interpretation. */
@Entity('interpretation_revisions')
@Index(['interpretationId', 'number'], { unique: true })
export class InterpretationRevisionEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Column({ type: 'integer' })
  interpretationId: number;

  @ManyToOne(() => InterpretationEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'interpretationId' })
  interpretation: Relation<InterpretationEntity>;

  @Column({ type: 'integer' })
  number: number;

  @Column({ type: 'simple-json' })
  content: InterpretationTexts;

  @Column({ type: 'integer', nullable: true })
  savedById: number | null;

  @ManyToOne(() => UserEntity, { nullable: true, onDelete: 'SET NULL' })
  @JoinColumn({ name: 'savedById' })
  savedBy: Relation<UserEntity> | null;

  @Column({ type: 'datetime' })
  savedAt: Date;
}
