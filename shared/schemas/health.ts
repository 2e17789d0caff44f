import { z } from 'zod';

export const healthResponse = z
  .object({
    status: z.enum(['ok', 'degraded']),
    version: z.string(),
    database: z.object({ status: z.enum(['ok', 'error']), pendingMigrations: z.number().int(), journalMode: z.string() }),
    fakes: z.object({ mail: z.object({ running: z.boolean(), port: z.number().int().nullable() }) }),
  })
  .meta({ id: 'Health' });
export type HealthResponse = z.infer<typeof healthResponse>;
