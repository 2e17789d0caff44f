import { ref } from 'vue';
import type { z } from 'zod';
import { ApiRequestError } from '@/api/client';
import { readableMessage } from '@shared/schemas/issue-message';

/**
 * Form errors in one place: checks a body with the same zod schema the server uses, and takes
 * the server's `fields` when it answers 400/409/422.
 */
export function useFieldErrors() {
  const fields = ref<Record<string, string>>({});
  const message = ref<string | null>(null);

  function clear() {
    fields.value = {};
    message.value = null;
  }

  function check<T extends z.ZodType>(schema: T, value: unknown): z.output<T> | null {
    clear();
    const result = schema.safeParse(value);
    if (result.success) return result.data;
    for (const issue of result.error.issues) fields.value[issue.path.join('.') || '_'] ??= readableMessage(issue.message, issue.path);
    message.value = 'Some fields need attention.';
    return null;
  }

  /** An error the schema cannot find, such as a confirmation that differs, reported as `check` does. */
  function add(field: string, text: string) {
    fields.value[field] = text;
    message.value = 'Some fields need attention.';
  }

  function take(err: unknown) {
    if (err instanceof ApiRequestError) {
      fields.value = { ...err.fields };
      message.value = err.message;
    } else {
      message.value = 'Something went wrong. Try again.';
    }
  }

  return { fields, message, clear, check, add, take };
}
