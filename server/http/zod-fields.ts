import type { z } from 'zod';

/** Flattens zod issues into `{ "path.to.field": "first message" }`. */
export function fieldsFromZodError(error: z.ZodError, prefix = ''): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const issue of error.issues) {
    const key = [prefix, ...issue.path.map(String)].filter(Boolean).join('.') || prefix || '_';
    fields[key] ??= issue.message;
  }
  return fields;
}
