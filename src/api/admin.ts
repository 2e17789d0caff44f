import type { BackupStatus } from '@shared/schemas/backup';
import type { AuditAction, AuditEvent } from '@shared/schemas/audit';
import type { Page } from '@shared/schemas/common';
import type { OutboxMessage, OutboxPage } from '@shared/schemas/outbox';
import type { OrganisationSettings, UpdateSettingsBody } from '@shared/schemas/settings';
import { api } from './client';

export interface AuditListParams {
  page: number;
  pageSize: number;
  sort: string;
  actorId?: number;
  entityType?: string;
  action?: AuditAction;
  from?: string;
  to?: string;
}

export const listAuditEvents = (params: AuditListParams) => api.get<Page<AuditEvent>>('/audit-events', { ...params });
export const listAuditEntityTypes = () => api.get<string[]>('/audit-events/entity-types');
export const fetchSettings = () => api.get<OrganisationSettings>('/settings');
export const updateSettings = (body: UpdateSettingsBody) => api.patch<OrganisationSettings>('/settings', body);
export const listOutbox = (params: { page: number; pageSize: number; sort: string; to?: string }) => api.get<OutboxPage>('/outbox', { ...params });
export const getOutboxMessage = (id: string) => api.get<OutboxMessage>(`/outbox/${id}`);
export const fetchBackups = () => api.get<BackupStatus>('/backups');
export const startBackup = () => api.post<BackupStatus>('/backups');
