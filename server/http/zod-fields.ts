import type { z } from 'zod';
import { isInvalidCharactersIssue } from '../../shared/schemas/text.js';
import { readableMessage } from '../../shared/schemas/issue-message.js';

/** Flattens zod issues into `{ "path.to.field": "first message" }`; a refused character is told first. */
export function fieldsFromZodError(error: z.ZodError, prefix = ''): Record<string, string> {
  const fields: Record<string, string> = {};
  const issues = [...error.issues.filter(isInvalidCharactersIssue), ...error.issues.filter((i) => !isInvalidCharactersIssue(i))];
  for (const issue of issues) {
    const key = [prefix, ...issue.path.map(String)].filter(Boolean).join('.') || prefix || '_';
    fields[key] ??= readableMessage(issue.message, issue.path);
  }
  return fields;
}

