import { Column, Entity, PrimaryColumn, UpdateDateColumn, VersionColumn } from 'typeorm';
import { DEFAULT_RISK_SCALE, type RiskScale } from '../../../shared/calc/abc-risk.js';
import { DEFAULT_GIVING_SETTINGS, type GivingSettings } from '../../../shared/schemas/giving-settings.js';
import type { UnitSystem } from '../../../shared/schemas/settings.js';

/** The organisation's settings: a single row with id 1. */
@Entity('organisation_settings')
export class OrganisationSettingsEntity {
  @PrimaryColumn({ type: 'integer' })
  id: number;

  @Column({ type: 'varchar', length: 160 })
  organisationName: string;

  @Column({ type: 'varchar', length: 2, default: 'US' })
  country: string;

  @Column({ type: 'varchar', length: 3, default: 'USD' })
  currency: string;

  @Column({ type: 'varchar', length: 20, default: 'us-customary' })
  unitSystem: UnitSystem;

  @Column({ type: 'varchar', length: 254, default: '' })
  contactEmail: string;

  /** How object numbers are written: YYYY and N between separators (shared/calc/object-number.ts). */
  @Column({ type: 'varchar', length: 40, default: 'YYYY.N.N' })
  objectNumberPattern: string;

  /** Anchors of the ABC scales and floors of the priority bands (shared/calc/abc-risk.ts). */
  @Column({ type: 'simple-json', default: JSON.stringify(DEFAULT_RISK_SCALE) })
  riskScale: RiskScale;

  /** Gift bounds and presets in cents, and what acknowledgments say (shared/schemas/giving-settings.ts). */
  @Column({ type: 'simple-json', default: JSON.stringify(DEFAULT_GIVING_SETTINGS) })
  giving: GivingSettings;

  @UpdateDateColumn({ type: 'datetime' })
  updatedAt: Date;

  @VersionColumn({ type: 'integer' })
  version: number;
}
