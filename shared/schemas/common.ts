import { z } from 'zod';
import { refuseInvalidCharacters } from './text.js';

export const idParam = z.object({ id: z.coerce.number().int().positive() });
export type IdParam = z.infer<typeof idParam>;

export const PAGE_SIZE_MAX = 100;

/** `page`, `pageSize` and `sort` (a field, `-field` for descending) as every list takes them. */
export function listQuery<const S extends readonly [string, ...string[]]>(sortable: S, defaultSort: S[number] | `-${S[number]}`) {
  const sortValues = [...sortable, ...sortable.map((s) => `-${s}`)] as [string, ...string[]];
  return z.object({
    page: z.coerce.number().int().min(1).default(1),
    pageSize: z.coerce.number().int().min(1).max(PAGE_SIZE_MAX).default(25),
    sort: z.enum(sortValues).default(defaultSort),
  });
}

export function pageOf<T extends z.ZodType>(item: T) {
  return z.object({
    items: z.array(item),
    total: z.number().int(),
    page: z.number().int(),
    pageSize: z.number().int(),
  });
}

export interface Page<T> {
  items: T[];
  total: number;
  page: number;
  pageSize: number;
}

export const ERROR_CODES = [
  'bad_request',
  'validation',
  'unauthenticated',
  'forbidden',
  'csrf',
  'not_found',
  'conflict',
  'payload_too_large',
  'unsupported_media_type',
  'unprocessable',
  'invalid_characters',
  'invalid_rich_text',
  'malformed_upload',
  'rate_limited',
  'internal',
  'unavailable',
] as const;
export type ErrorCode = (typeof ERROR_CODES)[number];

export const errorEnvelope = z
  .object({
    error: z.object({
      code: z.enum(ERROR_CODES),
      message: z.string(),
      fields: z.record(z.string(), z.string()).optional(),
      retryAfterSeconds: z.number().int().optional(),
    }),
  })
  .meta({ id: 'Error' });
export type ErrorEnvelope = z.infer<typeof errorEnvelope>;

export const email = refuseInvalidCharacters(z.string(), 'E-mail address')
  .trim()
  .toLowerCase()
  .max(254, 'E-mail address must be at most 254 characters.')
  .pipe(z.email('Enter a valid e-mail address.'));
