import { z } from 'zod';

export const designationQuery = z.object({
  value: z.string({ error: 'Give a designation, e.g. 3-110-2-E.' }).trim().min(1, 'Give a designation, e.g. 3-110-2-E.').max(40, 'A designation is at most 40 characters.'),
  scheme: z.enum(['us-navy-1949'], { error: 'The only scheme that can be parsed is us-navy-1949.' }).default('us-navy-1949'),
});
export type DesignationQuery = z.infer<typeof designationQuery>;

const meaning = z.string();

export const designationResponse = z
  .object({
    scheme: z.literal('us-navy-1949'),
    value: z.string(),
    deck: z.object({ text: z.string(), level: z.number().int(), aboveMainDeck: z.boolean(), meaning }),
    frame: z.object({ number: z.number().int(), meaning }),
    position: z.object({ number: z.number().int(), side: z.enum(['centerline', 'starboard', 'port']), ordinal: z.number().int(), meaning }),
    use: z.object({ letters: z.string(), meaning }),
    explanation: z.string(),
    source: z.string(),
  })
  .meta({ id: 'Designation' });
export type DesignationResponse = z.infer<typeof designationResponse>;
