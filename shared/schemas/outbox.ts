import { z } from 'zod';
import { listQuery, pageOf } from './common.js';
import { line } from './text.js';

export const outboxMessageSummary = z
  .object({
    id: z.string(),
    from: z.string(),
    to: z.array(z.string()),
    subject: z.string(),
    receivedAt: z.string(),
  })
  .meta({ id: 'OutboxMessageSummary' });
export type OutboxMessageSummary = z.infer<typeof outboxMessageSummary>;

export const outboxMessage = outboxMessageSummary
  .extend({ text: z.string(), html: z.string().nullable() })
  .meta({ id: 'OutboxMessage' });
export type OutboxMessage = z.infer<typeof outboxMessage>;

export const outboxQuery = listQuery(['receivedAt'], '-receivedAt').extend({
  to: line(254, 'Recipient').optional(),
});
export type OutboxQuery = z.infer<typeof outboxQuery>;

export const outboxPage = pageOf(outboxMessageSummary)
  .extend({ available: z.boolean() })
  .meta({ id: 'OutboxPage' });
export type OutboxPage = z.infer<typeof outboxPage>;

export const outboxIdParam = z.object({ id: z.string().regex(/^[a-z0-9-]{1,64}$/i) });
