import { ApiRequestError } from '@/api/client';

/** A sentence for a person from whatever a request threw. */
export function errorText(err: unknown): string {
  if (err instanceof ApiRequestError) return err.message;
  return 'Something went wrong. Try again.';
}
