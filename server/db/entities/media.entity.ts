import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn, VersionColumn, type Relation } from 'typeorm';
import type { MediaKind, MediaOwnerType } from '../../../shared/schemas/media.js';
import { UserEntity } from './user.entity.js';
import { VesselEntity } from './vessel.entity.js';

/**
 * A photo or document attached to a record. Its files live in the file store under `storageKey`:
 * the original (staff only, EXIF intact) and, for photos, WebP derivatives without metadata.
 */
@Entity('media')
@Index(['ownerType', 'ownerId'])
export class MediaEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Index()
  @Column({ type: 'integer' })
  vesselId: number;

  @ManyToOne(() => VesselEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'vesselId' })
  vessel: Relation<VesselEntity>;

  @Column({ type: 'varchar', length: 20 })
  ownerType: MediaOwnerType;

  @Column({ type: 'integer' })
  ownerId: number;

  @Column({ type: 'varchar', length: 10 })
  kind: MediaKind;

  @Column({ type: 'varchar', length: 40 })
  mimeType: string;

  @Column({ type: 'varchar', length: 255 })
  fileName: string;

  @Column({ type: 'integer' })
  byteSize: number;

  @Column({ type: 'varchar', length: 64 })
  sha256: string;

  /** Folder of the files in the file store. */
  @Column({ type: 'varchar', length: 200 })
  storageKey: string;

  /** Upright size (after EXIF orientation) of a photo. */
  @Column({ type: 'integer', nullable: true })
  width: number | null;

  @Column({ type: 'integer', nullable: true })
  height: number | null;

  /** When the photo was taken, from EXIF, as written by the camera (no time zone). */
  @Column({ type: 'varchar', length: 19, nullable: true })
  takenAt: string | null;

  @Column({ type: 'varchar', length: 500, default: '' })
  caption: string;

  @Column({ type: 'varchar', length: 200, default: '' })
  credit: string;

  @Column({ type: 'varchar', length: 300, default: '' })
  altText: string;

  /** Marked by the staff for public pages and summaries; it is shown there only with alt text. */
  @Column({ type: 'boolean', default: false })
  publicUse: boolean;

  @Column({ type: 'varchar', length: 500, default: '' })
  rights: string;

  @Column({ type: 'integer', nullable: true })
  uploadedById: number | null;

  @ManyToOne(() => UserEntity, { nullable: true, onDelete: 'SET NULL' })
  @JoinColumn({ name: 'uploadedById' })
  uploadedBy: Relation<UserEntity> | null;

  @CreateDateColumn({ type: 'datetime' })
  createdAt: Date;

  @UpdateDateColumn({ type: 'datetime' })
  updatedAt: Date;

  @VersionColumn({ type: 'integer' })
  version: number;
}
