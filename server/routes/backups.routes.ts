import { z } from 'zod';
import { backupStatus } from '../../shared/schemas/backup.js';
import type { ApiRouter } from '../http/api-router.js';
import { allowed } from '../http/access.js';
import type { BackupService } from '../services/backup.service.js';

export function backupRoutes(api: ApiRouter, backups: BackupService) {
  api.route({
    method: 'get',
    path: '/backups',
    tag: 'Backups',
    summary: 'The last backup, its size, any failure since, the schedule and the backups kept',
    access: allowed('backup', 'read'),
    response: backupStatus,
    handler: () => backups.status(),
  });

  api.route({
    method: 'post',
    path: '/backups',
    tag: 'Backups',
    summary: 'Start a backup now; it runs in the background and its outcome appears in the status',
    access: allowed('backup', 'create'),
    body: z.object({}).strict(),
    status: 202,
    response: backupStatus,
    errors: [409],
    handler: () => backups.start(),
  });
}
