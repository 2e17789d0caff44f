import { z } from 'zod';

export const backupStatus = z
  .object({
    directory: z.string(),
    keep: z.number().int(),
    /** Hour of the daily backup in the server's local time (0–23). */
    hour: z.number().int(),
    /** When the next daily backup is due; null when no schedule runs in this process. */
    nextAt: z.string().nullable(),
    /** When the backup now running started, or null. */
    runningSince: z.string().nullable(),
    lastSuccess: z
      .object({ at: z.string(), name: z.string(), path: z.string(), sizeBytes: z.number().int(), fileCount: z.number().int(), missingFiles: z.number().int(), durationMs: z.number().int() })
      .nullable(),
    /** The latest failure since the last success. */
    lastFailure: z.object({ at: z.string(), message: z.string() }).nullable(),
    /** The backups kept, newest first. */
    backups: z.array(z.object({ name: z.string(), createdAt: z.string() })),
  })
  .meta({ id: 'BackupStatus' });
export type BackupStatus = z.infer<typeof backupStatus>;
