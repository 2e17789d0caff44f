import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { can, type Resource } from '../../shared/permissions.js';
import { ROLES, type Role } from '../../shared/roles.js';
import type { RouteSpec } from '../../server/http/api-router.js';
import { Client, signedInAs } from '../support/http.js';
import { createTestApp, type TestApp } from '../support/test-app.js';

/**
 * Every route registered on the API router must carry a declared rule, and every role and an
 * anonymous caller must get the answer that rule promises. A route added without a rule fails here.
 */
let ctx: TestApp;
const clients = new Map<Role | 'anonymous', Client>();

beforeAll(async () => {
  ctx = await createTestApp();
  for (const role of ROLES) clients.set(role, (await signedInAs(ctx.app, ctx.store, role)).client);
  const anonymous = new Client(ctx.app);
  await anonymous.fetchCsrf();
  clients.set('anonymous', anonymous);
});
afterAll(() => ctx.close());

interface Registered {
  method: string;
  path: string;
}

function registeredRoutes(): Registered[] {
  const stack = (ctx.api.router as unknown as { stack: { route?: { path: string; methods: Record<string, boolean> } }[] }).stack;
  return stack
    .filter((layer) => layer.route)
    .flatMap((layer) => Object.keys(layer.route!.methods).filter((m) => m !== '_all').map((method) => ({ method, path: layer.route!.path })));
}

function specFor(route: Registered): RouteSpec | undefined {
  return ctx.routes.find((spec) => spec.method === route.method && spec.path === route.path);
}

function concretePath(path: string): string {
  return `/api/v1${path.replace(/:id\b/g, '999999').replace(/:[A-Za-z]+/g, 'x')}`;
}

function expectedFor(spec: RouteSpec, who: Role | 'anonymous'): 'allowed' | 401 | 403 {
  if (spec.access.kind === 'public') return 'allowed';
  if (who === 'anonymous') return 401;
  if (spec.access.kind === 'signed-in') return 'allowed';
  return can(who, spec.access.resource as Resource, spec.access.action as never) ? 'allowed' : 403;
}

describe('authorization of every API route', () => {
  it('finds the routes on the router', () => {
    expect(registeredRoutes().length).toBeGreaterThan(20);
  });

  it('has a declared rule for every registered route', () => {
    const undeclared = registeredRoutes().filter((route) => !specFor(route));
    expect(undeclared).toEqual([]);
  });

  it('declares only known resources and actions', () => {
    for (const spec of ctx.routes) {
      if (spec.access.kind !== 'permission') continue;
      const anyRole = ROLES.some((role) => can(role, spec.access.kind === 'permission' ? spec.access.resource : ('vessel' as Resource), (spec.access as { action: string }).action as never));
      expect(anyRole, `${spec.method} ${spec.path} names ${spec.access.resource}.${spec.access.action}`).toBe(true);
    }
  });

  const callers: (Role | 'anonymous')[] = ['anonymous', ...ROLES];

  it.each(callers)('answers %s as the declaration says on every route', async (who) => {
    const client = clients.get(who)!;
    const failures: string[] = [];
    for (const route of registeredRoutes()) {
      const spec = specFor(route)!;
      // Sign-out would end the session this loop depends on; it is public and covered in auth tests.
      if (spec.path === '/auth/logout') continue;
      const path = concretePath(route.path);
      const res = route.method === 'get' ? await client.get(path) : await client.send(route.method as 'post', path, {});
      const expected = expectedFor(spec, who);
      const ok = expected === 'allowed' ? res.status !== 401 && res.status !== 403 : res.status === expected;
      if (!ok) failures.push(`${route.method.toUpperCase()} ${route.path}: expected ${expected}, got ${res.status} ${JSON.stringify(res.body)}`);
      if (expected === 403) expect(res.body.error.code).toBe('forbidden');
      if (expected === 401) expect(res.body.error.code).toBe('unauthenticated');
    }
    expect(failures).toEqual([]);
  });
});
