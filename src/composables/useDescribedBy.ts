import type { Ref } from 'vue';

/**
 * `aria-describedby` for a form field: its help text and, when it has one, its error message,
 * whose element id is `<prefix>-<field>-error`.
 */
export function useDescribedBy(fields: Ref<Record<string, string>>, prefix: string) {
  const errorId = (field: string) => `${prefix}-${field}-error`;
  function describedBy(field: string, help?: string): string | undefined {
    const ids = [help, fields.value[field] ? errorId(field) : undefined].filter(Boolean);
    return ids.length ? ids.join(' ') : undefined;
  }
  return { describedBy, errorId };
}
