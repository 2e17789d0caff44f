import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { fieldsFromZodError } from '../../server/http/zod-fields.js';

describe('validation messages', () => {
  const body = z.object({ title: z.string(), unitCostCents: z.number().int(), lines: z.array(z.object({ description: z.string() })), note: z.string({ error: 'Write a note.' }) });

  it('says which field is missing or of the wrong kind, in words, instead of the library wording', () => {
    const result = body.safeParse({ unitCostCents: 'ten', lines: [{ description: 5 }], note: 3 });
    expect(result.success).toBe(false);
    expect(fieldsFromZodError(result.error!)).toEqual({
      title: 'Title is required.',
      unitCostCents: 'Unit cost must be a number.',
      'lines.0.description': 'Description must be text.',
      note: 'Write a note.',
    });
  });
});
