import { OpenAPIRegistry, OpenApiGeneratorV3, type RouteConfig } from '@asteasolutions/zod-to-openapi';
import type { z } from 'zod';
import { errorEnvelope } from '../../shared/schemas/common.js';
import { PERMISSIONS } from '../../shared/permissions.js';
import type { RouteSpec } from './api-router.js';

const ERROR_TEXT: Record<number, string> = {
  400: 'Malformed request; `fields` names what is wrong (code `malformed_upload` for a multipart body that cannot be read or a file name with control characters)',
  401: 'Not signed in',
  403: 'Role may not do this, or the CSRF token is missing or wrong (code `csrf`)',
  404: 'Not found',
  409: 'Conflict with the current state (stale version or duplicate)',
  413: 'Too large',
  415: 'Unsupported media type',
  422: 'Understood but cannot be done; code `invalid_characters` when text holds control or text-direction characters (`fields` names them)',
  429: 'Too many attempts; see Retry-After',
  503: 'A service it depends on (the payment provider) cannot be reached; nothing was recorded',
};

export function openApiPath(expressPath: string): string {
  return `/api/v1${expressPath.replace(/:([A-Za-z0-9_]+)/g, '{$1}')}`;
}

function accessText(spec: RouteSpec): string {
  if (spec.access.kind === 'public') return 'Anyone, signed in or not.';
  if (spec.access.kind === 'signed-in') return 'Any signed-in user.';
  const roles = (PERMISSIONS[spec.access.resource] as Record<string, readonly string[]>)[spec.access.action] ?? [];
  return `Roles: ${roles.join(', ')} (${spec.access.resource}.${spec.access.action}).`;
}

export function buildOpenApiDocument(routes: RouteSpec[], version: string) {
  const registry = new OpenAPIRegistry();
  registry.registerComponent('securitySchemes', 'session', { type: 'apiKey', in: 'cookie', name: 'shipkeeper.sid' });
  registry.registerComponent('securitySchemes', 'csrf', { type: 'apiKey', in: 'header', name: 'x-csrf-token' });

  for (const spec of routes) {
    const status = spec.status ?? 200;
    const responses: RouteConfig['responses'] = {
      [status]:
        spec.response && status !== 204
          ? { description: 'Success', content: { [spec.produces ?? 'application/json']: { schema: spec.response } } }
          : { description: 'Success, no content' },
    };
    const errorStatuses = new Set<number>(spec.errors ?? []);
    if (spec.params || spec.query || spec.body) errorStatuses.add(400);
    if (spec.query || spec.body) errorStatuses.add(422);
    if (spec.access.kind !== 'public') errorStatuses.add(401);
    if (spec.access.kind === 'permission' || spec.method !== 'get') errorStatuses.add(403);
    for (const code of [...errorStatuses].sort()) {
      responses[code] = { description: ERROR_TEXT[code] ?? 'Error', content: { 'application/json': { schema: errorEnvelope } } };
    }
    const isChange = spec.method !== 'get';
    registry.registerPath({
      method: spec.method,
      path: openApiPath(spec.path),
      tags: [spec.tag],
      summary: spec.summary,
      description: `Who may call it: ${accessText(spec)}${isChange ? ' Send the CSRF token in x-csrf-token.' : ''}`,
      security: spec.access.kind === 'public' ? (isChange ? [{ csrf: [] }] : []) : [{ session: [], ...(isChange ? { csrf: [] } : {}) }],
      request: {
        ...(spec.params && { params: spec.params as z.ZodObject }),
        ...(spec.query && { query: spec.query as z.ZodObject }),
        ...(spec.body && { body: { content: { 'application/json': { schema: spec.body } } } }),
      },
      responses,
    });
  }

  return new OpenApiGeneratorV3(registry.definitions).generateDocument({
    openapi: '3.0.3',
    info: {
      title: 'Shipkeeper API',
      version,
      description: 'JSON under /api/v1. Errors: { "error": { "code", "message", "fields"? } }. Lists: page, pageSize, sort (field or -field) and filters; answers { items, total, page, pageSize }.',
    },
    servers: [{ url: '/' }],
  });
}
