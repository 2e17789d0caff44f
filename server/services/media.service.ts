import { randomUUID } from 'node:crypto';
import { unlink } from 'node:fs/promises';
import path from 'node:path';
import { fileTypeFromFile } from 'file-type';
import { AUDIO_FORMATS, DOCUMENT_FORMATS, PHOTO_FORMATS, UPLOAD_FORMATS, type MediaOwnerQuery, type MediaOwnerType, type UpdateMediaBody } from '../../shared/schemas/media.js';
import type { MediaEntity } from '../db/entities/media.entity.js';
import type { Repositories, Store } from '../db/store.js';
import { ApiError, ConflictError, ForbiddenError, NotFoundError, ValidationError } from '../http/errors.js';
import { canChangeMediaOf, presentMedia } from '../presenters/media.presenter.js';
import type { FileStore } from '../storage/file-store.js';
import { sha256File } from '../storage/hash-file.js';
import { changesBetween, recordAudit, type Actor } from './audit.service.js';
import { staleEditError } from './stale-edit.js';
import { assertMayReadMediaOf } from './media-access.js';
import { derivativeFile, makeDerivatives, type PhotoFacts } from './media-derivatives.js';
import type { UploadedFile } from './plan.service.js';

const EXTENSIONS: Record<string, string> = { 'image/jpeg': 'jpg', 'image/png': 'png', 'image/webp': 'webp', 'application/pdf': 'pdf', 'audio/mpeg': 'mp3', 'audio/x-m4a': 'm4a', 'audio/ogg': 'ogg', 'audio/ogg; codecs=opus': 'opus' };
const OWNER_LABELS: Record<MediaOwnerType, string> = { artifact: 'an artifact', compartment: 'a compartment', 'condition-report': 'a condition report', incident: 'an incident', 'treatment-before': 'a treatment', 'treatment-after': 'a treatment', tour: 'a tour' };

/** What an upload may be: a photo or a PDF on any record, or an audio clip on a tour. */
export type UploadAccepts = 'photo-or-document' | 'audio';
const REFUSED: Record<UploadAccepts, { message: string; field: string }> = {
  'photo-or-document': { message: 'This file is not a JPEG, PNG, WebP or PDF file, whatever its name says.', field: 'Not a JPEG, PNG, WebP or PDF file.' },
  audio: { message: 'This file is not an MP3, M4A or Ogg audio file, whatever its name says.', field: 'Not an MP3, M4A or Ogg audio file.' },
};

interface Owner {
  vesselId: number;
  label: string;
  /** A submitted report's photos no longer change. */
  locked?: boolean;
}

const KIND_LABELS = { photo: 'Photo', document: 'Document', audio: 'Audio clip' } as const;

function safeFileName(name: string): string {
  const base = path.basename(name).replace(/[\u0000-\u001f\u007f"\\/]/g, '_').trim();
  return base.slice(0, 200) || 'file';
}

/**
 * Photos and documents on records. A file is checked by its content, its derivatives are made in
 * a scratch folder, and only then is the row written; whatever fails on the way removes the files.
 */
export class MediaService {
  constructor(private readonly store: Store, private readonly files: FileStore) {}

  private async ownerOf(repos: Repositories, ownerType: MediaOwnerType, ownerId: number): Promise<Owner> {
    if (ownerType === 'artifact') {
      const artifact = await repos.artifacts.findById(ownerId);
      if (!artifact) throw new NotFoundError('The artifact');
      return { vesselId: artifact.vesselId, label: `artifact ${artifact.objectNumber}` };
    }
    if (ownerType === 'incident') {
      const incident = await repos.incidents.findById(ownerId);
      if (!incident) throw new NotFoundError('The incident');
      return { vesselId: incident.vesselId, label: `incident ${incident.id}` };
    }
    if (ownerType === 'condition-report') {
      const report = await repos.conditionReports.findById(ownerId);
      if (!report) throw new NotFoundError('The condition report');
      return { vesselId: report.vesselId, label: `condition report ${report.id}`, locked: report.status !== 'draft' };
    }
    if (ownerType === 'tour') {
      const tour = await repos.tours.findPlain(ownerId);
      if (!tour) throw new NotFoundError('The tour');
      return { vesselId: tour.vesselId, label: `tour ${tour.title}` };
    }
    if (ownerType === 'treatment-before' || ownerType === 'treatment-after') {
      const treatment = await repos.treatments.findById(ownerId);
      if (!treatment) throw new NotFoundError('The treatment');
      return { vesselId: treatment.vesselId, label: `treatment ${treatment.id} (${ownerType === 'treatment-before' ? 'before' : 'after'})` };
    }
    const compartment = await repos.compartments.findById(ownerId);
    if (!compartment) throw new NotFoundError('The compartment');
    return { vesselId: compartment.vesselId, label: `compartment ${compartment.designation}` };
  }

  private mayChange(viewer: Express.User, ownerType: MediaOwnerType, action: 'create' | 'update' | 'delete') {
    if (!canChangeMediaOf(viewer.role, ownerType, action)) {
      throw new ForbiddenError(`Your role cannot change the files of ${OWNER_LABELS[ownerType]}.`);
    }
  }

  async list(query: MediaOwnerQuery, viewer: Express.User) {
    assertMayReadMediaOf(viewer, query.ownerType);
    const owner = await this.ownerOf(this.store.repos, query.ownerType, query.ownerId);
    return (await this.store.repos.media.forOwner(query.ownerType, query.ownerId)).map((m) => presentMedia(m, viewer, owner.locked));
  }

  async get(id: number, viewer: Express.User) {
    const media = await this.store.repos.media.findById(id);
    if (!media) throw new NotFoundError('The file');
    assertMayReadMediaOf(viewer, media.ownerType);
    return presentMedia(media, viewer, (await this.ownerOf(this.store.repos, media.ownerType, media.ownerId)).locked);
  }

  /** The file to send for a variant, with its type and a download name. */
  async file(id: number, variant: 'thumb' | 'display' | 'original', viewer: Express.User) {
    const media = await this.store.repos.media.findById(id);
    if (!media) throw new NotFoundError('The file');
    assertMayReadMediaOf(viewer, media.ownerType);
    if (variant !== 'original' && media.kind !== 'photo') throw new NotFoundError('A preview of this file');
    if (variant === 'original') {
      return { path: this.files.path(path.join(media.storageKey, `original.${EXTENSIONS[media.mimeType]}`)), type: media.mimeType, name: media.fileName };
    }
    return { path: derivativeFile(this.files.path(media.storageKey), variant), type: 'image/webp', name: `${path.parse(media.fileName).name}-${variant}.webp` };
  }

  /**
   * A file that a published record shows the public (a published tour lists its files; the caller
   * has checked that it does): a photo's WebP derivative, never an original, or an audio clip.
   */
  async publicFile(id: number, variant: 'thumb' | 'display' | 'audio') {
    const media = await this.store.repos.media.findById(id);
    if (!media) throw new NotFoundError('The file');
    if (variant === 'audio') {
      if (media.kind !== 'audio') throw new NotFoundError('The audio clip');
      return { path: this.files.path(path.join(media.storageKey, `original.${EXTENSIONS[media.mimeType]}`)), type: media.mimeType.split(';')[0]!, name: media.fileName };
    }
    if (media.kind !== 'photo') throw new NotFoundError('A preview of this file');
    // published pages keep pointing at a photo someone has since withdrawn from public use
    if (!media.publicUse || !media.altText.trim()) throw new NotFoundError('The file');
    return { path: derivativeFile(this.files.path(media.storageKey), variant), type: 'image/webp', name: `${path.parse(media.fileName).name}-${variant}.webp` };
  }

  /** Checks and keeps one uploaded file; the temporary file is always consumed. */
  async upload(query: MediaOwnerQuery, file: UploadedFile | undefined, viewer: Express.User, actor: Actor, accepts: UploadAccepts = 'photo-or-document') {
    if (!file) throw new ValidationError({ file: accepts === 'audio' ? 'Choose an MP3, M4A or Ogg file to upload.' : 'Choose a photo or PDF to upload.' });
    let work: string | null = null;
    let storageKey: string | null = null;
    try {
      this.mayChange(viewer, query.ownerType, 'create');
      const owner = await this.ownerOf(this.store.repos, query.ownerType, query.ownerId);
      if (owner.locked) throw new ConflictError('This report is submitted, so its photos no longer change. Amend it to add photos.');
      const type = await fileTypeFromFile(file.path);
      const formats: readonly string[] = accepts === 'audio' ? AUDIO_FORMATS : UPLOAD_FORMATS;
      if (!type || !formats.includes(type.mime)) {
        throw new ApiError(415, 'unsupported_media_type', REFUSED[accepts].message, { file: REFUSED[accepts].field });
      }
      const kind = accepts === 'audio' ? 'audio' : (PHOTO_FORMATS as readonly string[]).includes(type.mime) ? 'photo' : 'document';
      work = await this.files.scratch(`media-${randomUUID()}`);
      const original = path.join(work, `original.${EXTENSIONS[type.mime]}`);
      await this.files.moveIn(file.path, path.relative(this.files.root, original));
      let facts: PhotoFacts | null = null;
      if (kind === 'photo') {
        facts = await makeDerivatives(original, work).catch(() => {
          throw new ApiError(415, 'unsupported_media_type', 'This file could not be read as an image. It may be damaged.', { file: 'Unreadable image.' });
        });
      } else if (kind === 'document' && !(DOCUMENT_FORMATS as readonly string[]).includes(type.mime)) {
        throw new ApiError(415, 'unsupported_media_type', 'Only PDF documents are accepted.', { file: 'Not a PDF.' });
      }
      const sha256 = await sha256File(original);
      storageKey = `media/vessel-${owner.vesselId}/${path.basename(work)}`;
      await this.files.moveIn(work, storageKey);
      work = null;
      const key = storageKey;
      const saved = await this.store.transaction(async (repos) => {
        // The owner may have gone, or been submitted, while the file was processed.
        if ((await this.ownerOf(repos, query.ownerType, query.ownerId)).locked) throw new ConflictError('This report was submitted meanwhile; its photos no longer change.');
        const media = await repos.media.create({
          vesselId: owner.vesselId,
          ownerType: query.ownerType,
          ownerId: query.ownerId,
          kind,
          mimeType: type.mime,
          fileName: safeFileName(file.originalname),
          byteSize: file.size,
          sha256,
          storageKey: key,
          width: facts?.width ?? null,
          height: facts?.height ?? null,
          takenAt: facts?.takenAt ?? null,
          caption: '',
          credit: '',
          altText: '',
          publicUse: false,
          rights: '',
          uploadedById: viewer.id,
        });
        await this.refreshCover(repos, query.ownerType, query.ownerId);
        await recordAudit(repos, actor, {
          action: 'upload',
          entityType: 'media',
          entityId: media.id,
          vesselId: owner.vesselId,
          summary: `${KIND_LABELS[kind]} ${media.fileName} added to ${owner.label}`,
        });
        return media;
      });
      storageKey = null;
      return presentMedia((await this.store.repos.media.findById(saved.id))!, viewer);
    } finally {
      await unlink(file.path).catch(() => undefined);
      if (work) await this.files.removePath(work);
      if (storageKey) await this.files.remove(storageKey);
    }
  }

  async update(id: number, body: UpdateMediaBody, viewer: Express.User, actor: Actor) {
    await this.store.transaction(async (repos) => {
      const media = await repos.media.findById(id);
      if (!media) throw new NotFoundError('The file');
      this.mayChange(viewer, media.ownerType, 'update');
      if ((await this.ownerOf(repos, media.ownerType, media.ownerId)).locked) throw new ConflictError('This report is submitted, so its photos no longer change.');
      if (media.version !== body.version) {
        throw await staleEditError(repos, 'media', id, 'this file’s details', media.version, body.version);
      }
      const { version: _version, ...fields } = body;
      const changes = changesBetween(media, fields, ['caption', 'credit', 'altText', 'rights', 'publicUse']);
      if (!changes) return;
      Object.assign(media, fields);
      await repos.media.save(media);
      await recordAudit(repos, actor, { action: 'update', entityType: 'media', entityId: id, vesselId: media.vesselId, summary: `Details of ${media.fileName} changed`, changes });
    });
    return this.get(id, viewer);
  }

  async remove(id: number, viewer: Express.User, actor: Actor) {
    const removed = await this.store.transaction(async (repos) => {
      const media = await repos.media.findById(id);
      if (!media) throw new NotFoundError('The file');
      this.mayChange(viewer, media.ownerType, 'delete');
      if ((await this.ownerOf(repos, media.ownerType, media.ownerId)).locked) throw new ConflictError('This report is submitted, so its photos no longer change.');
      if ((await repos.conditionReports.submittedFindingsOnPhoto(id)) > 0) {
        throw new ConflictError('A submitted condition report marks a finding on this photo, so the photo is kept with the record.');
      }
      await repos.media.remove(id);
      await this.refreshCover(repos, media.ownerType, media.ownerId);
      await recordAudit(repos, actor, {
        action: 'delete',
        entityType: 'media',
        entityId: id,
        vesselId: media.vesselId,
        summary: `${KIND_LABELS[media.kind]} ${media.fileName} deleted from ${media.ownerType} ${media.ownerId}`,
        changes: changesBetween({} as MediaEntity, media, ['fileName', 'caption', 'credit', 'altText', 'rights', 'sha256']),
      });
      return media;
    });
    // The files go once the row is gone for good.
    await this.files.remove(removed.storageKey);
  }

  /** An artifact's cover is its first photo. */
  private async refreshCover(repos: Repositories, ownerType: MediaOwnerType, ownerId: number) {
    if (ownerType !== 'artifact') return;
    const first = await repos.media.firstPhoto(ownerType, ownerId);
    await repos.artifacts.setCover(ownerId, first?.id ?? null);
  }
}
