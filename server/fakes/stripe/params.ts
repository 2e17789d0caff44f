import { invalidParam, missingParam } from './errors.js';

/** Readers for form-encoded Stripe parameters (every value arrives as a string or a nested object). */
export type Params = Record<string, unknown>;

export function refuseUnknown(params: Params, allowed: readonly string[], prefix = ''): void {
  for (const key of Object.keys(params)) {
    if (!allowed.includes(key)) {
      const name = prefix ? `${prefix}[${key}]` : key;
      throw invalidParam(`Received unknown parameter: ${name}`, name, 'parameter_unknown');
    }
  }
}

export function optionalString(params: Params, key: string, param = key): string | null {
  const v = params[key];
  if (v === undefined || v === '') return null;
  if (typeof v !== 'string') throw invalidParam(`Invalid string: ${param}`, param, 'parameter_invalid_string');
  return v;
}

export function requiredString(params: Params, key: string, param = key): string {
  const v = optionalString(params, key, param);
  if (v === null) throw missingParam(param);
  return v;
}

export function optionalInteger(params: Params, key: string, param = key): number | null {
  const v = params[key];
  if (v === undefined || v === '') return null;
  if (typeof v !== 'string' || !/^-?\d+$/.test(v) || !Number.isSafeInteger(Number(v))) {
    throw invalidParam(`Invalid integer: ${typeof v === 'string' ? v : param}`, param, 'parameter_invalid_integer');
  }
  return Number(v);
}

export function optionalObject(params: Params, key: string, param = key): Params | null {
  const v = params[key];
  if (v === undefined || v === '') return null;
  if (typeof v !== 'object' || v === null || Array.isArray(v)) throw invalidParam(`Invalid object: ${param}`, param, 'parameter_invalid_object');
  return v as Params;
}

/** Stripe's metadata rules: at most 50 keys, keys up to 40 characters, values up to 500. */
export function metadataOf(params: Params): Record<string, string> {
  const raw = optionalObject(params, 'metadata') ?? {};
  const out: Record<string, string> = {};
  const keys = Object.keys(raw);
  if (keys.length > 50) throw invalidParam('Invalid metadata: metadata can have up to 50 keys.', 'metadata');
  for (const key of keys) {
    const value = raw[key];
    if (typeof value !== 'string') throw invalidParam(`Invalid string: metadata[${key}]`, `metadata[${key}]`, 'parameter_invalid_string');
    if (key.length > 40) throw invalidParam('Invalid metadata: keys can be up to 40 characters long.', 'metadata');
    if (value.length > 500) throw invalidParam('Invalid metadata: values can be up to 500 characters long.', `metadata[${key}]`);
    if (value !== '') out[key] = value;
  }
  return out;
}

/** `expand[]=a&expand[]=b` arrives as an array (qs) or, for one value, possibly a string. */
export function expandOf(params: Params): string[] {
  const v = params.expand;
  if (v === undefined) return [];
  const list = Array.isArray(v) ? v : typeof v === 'object' && v !== null ? Object.values(v) : [v];
  return list.filter((x): x is string => typeof x === 'string');
}

export function httpUrl(value: string, param: string): string {
  try {
    const url = new URL(value);
    if (url.protocol === 'http:' || url.protocol === 'https:') return value;
  } catch {
    // fall through
  }
  throw invalidParam('Not a valid URL', param, 'url_invalid');
}
