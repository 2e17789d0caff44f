import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { signedInAs } from '../support/http.js';
import { createTestApp, type TestApp } from '../support/test-app.js';

let ctx: TestApp | undefined;
let clientDir: string | undefined;
afterEach(async () => {
  await ctx?.close();
  ctx = undefined;
  if (clientDir) rmSync(clientDir, { recursive: true, force: true });
});

function builtClient(): string {
  clientDir = mkdtempSync(path.join(tmpdir(), 'shipkeeper-client-'));
  mkdirSync(path.join(clientDir, 'assets'));
  writeFileSync(path.join(clientDir, 'index.html'), '<!doctype html><title>Shipkeeper</title>');
  writeFileSync(path.join(clientDir, 'assets', 'main-abc123.js'), 'console.log(1)');
  writeFileSync(path.join(clientDir, 'favicon.svg'), '<svg xmlns="http://www.w3.org/2000/svg"/>');
  return clientDir;
}

describe('the built client', () => {
  it('is served without a session cookie, even to a signed-in person', async () => {
    ctx = await createTestApp({ clientDir: builtClient() });
    const { client } = await signedInAs(ctx.app, ctx.store, 'curator');
    const asset = await client.get('/assets/main-abc123.js');
    expect(asset.status).toBe(200);
    expect(asset.headers['cache-control']).toMatch(/immutable/);
    expect(asset.headers['set-cookie']).toBeUndefined();
    for (const page of ['/favicon.svg', '/app/collection', '/visit']) {
      const res = await client.get(page);
      expect(res.status, page).toBe(200);
      expect(res.headers['set-cookie'], page).toBeUndefined();
    }
    expect((await client.get('/app/collection')).text).toContain('<title>Shipkeeper</title>');
    // the API still has its session and its own 404
    expect((await client.get('/api/v1/auth/me')).status).toBe(200);
    expect((await client.get('/api/v1/no-such-thing')).body.error.code).toBe('not_found');
    expect((await client.get('/assets/missing.js')).status).toBe(404);
  });
});

describe('Strict-Transport-Security', () => {
  it('is sent only over https', async () => {
    ctx = await createTestApp({ trustProxy: true });
    const { client } = await signedInAs(ctx.app, ctx.store, 'curator');
    expect((await client.get('/api/v1/health')).headers['strict-transport-security']).toBeUndefined();
    const secure = await client.agent.get('/api/v1/health').set('x-forwarded-proto', 'https');
    expect(secure.headers['strict-transport-security']).toMatch(/max-age=\d+/);
  });
});
