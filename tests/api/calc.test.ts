import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Client } from '../support/http.js';
import { createTestApp, type TestApp } from '../support/test-app.js';

let ctx: TestApp;
beforeAll(async () => {
  ctx = await createTestApp({}, { mail: false });
});
afterAll(() => ctx.close());

describe('GET /api/v1/calc/designation', () => {
  it('explains a designation in words, with its source', async () => {
    const res = await new Client(ctx.app).get('/api/v1/calc/designation?value=3-110-2-E&scheme=us-navy-1949');
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({
      value: '3-110-2-E',
      deck: { level: 3, meaning: 'third deck' },
      frame: { number: 110 },
      position: { side: 'port', ordinal: 1 },
      use: { letters: 'E', meaning: 'engineering space' },
      explanation: 'third deck, frame 110, first compartment to port, engineering space',
    });
    expect(res.body.source).toMatch(/NAVEDTRA 14325/);
  });

  it('answers 422 naming the part that is wrong', async () => {
    const res = await new Client(ctx.app).get('/api/v1/calc/designation?value=3-110-2-Z');
    expect(res.status).toBe(422);
    expect(res.body.error.code).toBe('unprocessable');
    expect(Object.keys(res.body.error.fields)).toEqual(['use']);
    expect(res.body.error.message).toMatch(/"Z" is not a use letter/);
  });

  it('answers 400 for a missing value or an unknown scheme', async () => {
    const res = await new Client(ctx.app).get('/api/v1/calc/designation?scheme=lloyds');
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['scheme', 'value']);
  });
});
