import { z } from 'zod';

/** Anonymous callers learn only `status`; the details are for administrators. */
export const healthResponse = z
  .object({
    status: z.enum(['ok', 'degraded']),
    version: z.string().optional(),
    database: z.object({ status: z.enum(['ok', 'error']), pendingMigrations: z.number().int(), journalMode: z.string() }).optional(),
    fakes: z.object({ mail: z.object({ running: z.boolean(), port: z.number().int().nullable() }) }).optional(),
  })
  .meta({ id: 'Health' });
export type HealthResponse = z.infer<typeof healthResponse>;
