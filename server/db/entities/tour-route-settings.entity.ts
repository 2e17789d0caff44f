import { Column, Entity, JoinColumn, OneToOne, PrimaryColumn, UpdateDateColumn, VersionColumn, type Relation } from 'typeorm';
import { DEFAULT_ROUTE_SETTINGS } from '../../../shared/calc/tour-route.js';
import { VesselEntity } from './vessel.entity.js';

/** How a vessel's tour routes are timed: the walking pace and the allowance per deck change. */
@Entity('tour_route_settings')
export class TourRouteSettingsEntity {
  @PrimaryColumn({ type: 'integer' })
  vesselId: number;

  @OneToOne(() => VesselEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'vesselId' })
  vessel: Relation<VesselEntity>;

  @Column({ type: 'real', default: DEFAULT_ROUTE_SETTINGS.walkingPaceMetresPerSecond })
  walkingPaceMetresPerSecond: number;

  @Column({ type: 'real', default: DEFAULT_ROUTE_SETTINGS.deckChangeMetres })
  deckChangeMetres: number;

  @UpdateDateColumn({ type: 'datetime' })
  updatedAt: Date;

  @VersionColumn({ type: 'integer' })
  version: number;
}
