import type { ImportMode, ImportResult } from '@shared/schemas/artifact-import';
import type { ArchiveArtifactBody, Artifact, ArtifactFilters, ArtifactMarker, ArtifactMove, ArtifactPage, ArtifactsQuery, CreateArtifactBody, MoveArtifactBody, UpdateArtifactBody } from '@shared/schemas/artifacts';
import type { Media, MediaOwnerType, UpdateMediaBody } from '@shared/schemas/media';
import { api, apiUrl, upload } from './client';

export const listArtifacts = (vesselId: number, params: Partial<ArtifactsQuery>) => api.get<ArtifactPage>(`/vessels/${vesselId}/artifacts`, params);
export const getArtifact = (id: number) => api.get<Artifact>(`/artifacts/${id}`);
export const createArtifact = (vesselId: number, body: CreateArtifactBody) => api.post<Artifact>(`/vessels/${vesselId}/artifacts`, body);
export const updateArtifact = (id: number, body: UpdateArtifactBody) => api.patch<Artifact>(`/artifacts/${id}`, body);
export const listMoves = (id: number) => api.get<ArtifactMove[]>(`/artifacts/${id}/moves`);
export const moveArtifact = (id: number, body: MoveArtifactBody) => api.post<Artifact>(`/artifacts/${id}/moves`, body);
export const archiveArtifact = (id: number, body: ArchiveArtifactBody) => api.post<Artifact>(`/artifacts/${id}/archive`, body);
export const listDeckArtifacts = (deckId: number) => api.get<ArtifactMarker[]>(`/decks/${deckId}/artifacts`);

/** Link that downloads the filtered list as CSV. */
export const artifactsExportUrl = (vesselId: number, filters: ArtifactFilters) => apiUrl(`/vessels/${vesselId}/artifacts/export`, { ...filters });
export const importArtifacts = (vesselId: number, file: File, mode: ImportMode, onProgress?: (fraction: number) => void) =>
  upload<ImportResult>(`/vessels/${vesselId}/artifacts/import`, file, onProgress, { query: { mode } });

export const listMedia = (ownerType: MediaOwnerType, ownerId: number) => api.get<Media[]>('/media', { ownerType, ownerId });
export const uploadMedia = (ownerType: MediaOwnerType, ownerId: number, file: File, onProgress?: (fraction: number) => void, signal?: AbortSignal) =>
  upload<Media>('/media', file, onProgress, { query: { ownerType, ownerId }, signal });
export const updateMedia = (id: number, body: UpdateMediaBody) => api.patch<Media>(`/media/${id}`, body);
export const deleteMedia = (id: number) => api.delete<void>(`/media/${id}`);
