import { canReadMediaOf } from '../../shared/permissions.js';
import type { MediaOwnerType } from '../../shared/schemas/media.js';
import { ForbiddenError } from '../http/errors.js';

const RESERVED: Partial<Record<MediaOwnerType, string>> = {
  'condition-report': 'The photos and documents of condition reports are kept for conservators, curators and administrators; your role reads their summaries.',
};

/**
 * The one read rule for files, applied wherever they are listed, described or served: a file
 * follows its owner's (`MEDIA_OWNERS` in shared/permissions.ts). 403 like the other reserved
 * parts of a record (the report PDF): the role knows the record, not its evidence.
 */
export function assertMayReadMediaOf(viewer: Express.User, ownerType: MediaOwnerType): void {
  if (!canReadMediaOf(viewer.role, ownerType)) throw new ForbiddenError(RESERVED[ownerType] ?? 'Your role does not read the files of this record.');
}

/** Keeps the files a viewer may read, for responses that embed files of several owners. */
export function readableMedia<T extends { ownerType: MediaOwnerType }>(viewer: Express.User, items: T[]): T[] {
  return items.filter((m) => canReadMediaOf(viewer.role, m.ownerType));
}
