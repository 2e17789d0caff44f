import { can, MEDIA_OWNERS } from '../../shared/permissions.js';
import type { Media, MediaOwnerType } from '../../shared/schemas/media.js';
import type { MediaEntity } from '../db/entities/media.entity.js';

export function mediaUrl(id: number, variant: 'thumb' | 'display' | 'original'): string {
  return `/api/v1/media/${id}/${variant}`;
}

/** Whether a role may add, change or delete files on this kind of record. */
export function canChangeMediaOf(role: Express.User['role'], ownerType: MediaOwnerType, action: 'create' | 'update' | 'delete'): boolean {
  const owner: { resource: (typeof MEDIA_OWNERS)[MediaOwnerType]['resource']; attach?: string } = MEDIA_OWNERS[ownerType];
  const needs = action === 'create' && owner.attach ? owner.attach : 'update';
  return can(role, 'media', action) && can(role, owner.resource, needs as never);
}

/** `locked`: the record no longer changes (a submitted report), so neither do its files. */
export function presentMedia(media: MediaEntity, viewer: Express.User, locked = false): Media {
  const photo = media.kind === 'photo';
  return {
    id: media.id,
    vesselId: media.vesselId,
    ownerType: media.ownerType,
    ownerId: media.ownerId,
    kind: media.kind,
    mimeType: media.mimeType as Media['mimeType'],
    fileName: media.fileName,
    byteSize: media.byteSize,
    width: media.width,
    height: media.height,
    takenAt: media.takenAt,
    caption: media.caption,
    credit: media.credit,
    altText: media.altText,
    rights: media.rights,
    publicUse: media.publicUse,
    publishable: photo && media.publicUse && media.altText.trim().length > 0,
    urls: { thumb: photo ? mediaUrl(media.id, 'thumb') : null, display: photo ? mediaUrl(media.id, 'display') : null, original: mediaUrl(media.id, 'original') },
    uploadedBy: media.uploadedBy ? { id: media.uploadedBy.id, name: media.uploadedBy.name } : null,
    createdAt: media.createdAt.toISOString(),
    version: media.version,
    abilities: { update: !locked && canChangeMediaOf(viewer.role, media.ownerType, 'update'), delete: !locked && canChangeMediaOf(viewer.role, media.ownerType, 'delete') },
  };
}
