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

describe('GET /api/v1/calc/rust-grade', () => {
  it('grades the percent rusted by ASTM D610-08 (R2019) Table 1, with the range and source', async () => {
    const res = await new Client(ctx.app).get('/api/v1/calc/rust-grade?percent=2&distribution=G');
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ percent: 2, grade: 5, label: '5-G', above: 1, upTo: 3, range: 'more than 1 % up to 3 %', source: 'ASTM D610-08 (reapproved 2019), Table 1' });
  });

  it('answers 422 with the valid range outside 0–100 and 400 for a non-number', async () => {
    const off = await new Client(ctx.app).get('/api/v1/calc/rust-grade?percent=120');
    expect(off.status).toBe(422);
    expect(off.body.error.fields.percent).toBe('Percent of surface rusted must be between 0 and 100.');
    expect((await new Client(ctx.app).get('/api/v1/calc/rust-grade?percent=lots')).status).toBe(400);
  });
});

describe('GET /api/v1/calc/abc-risk', () => {
  it('adds the scores into MR and names the band', async () => {
    const res = await new Client(ctx.app).get('/api/v1/calc/abc-risk?a=4&b=3.5&c=2');
    expect(res.body).toMatchObject({ a: 4, b: 3.5, c: 2, magnitude: 9.5, band: 'high', bandRange: 'MR 9.5–11' });
  });

  it('converts plain inputs on the logarithmic scales', async () => {
    // Once in 10 years → A 4; 10 % loss per item → B 4; 1 % of the asset → C 3 (scale anchors from memory, see REFERENCES.md).
    const res = await new Client(ctx.app).get('/api/v1/calc/abc-risk?yearsBetween=10&lossPerItemPercent=10&assetFractionPercent=1');
    expect(res.body).toMatchObject({ a: 4, b: 4, c: 3, magnitude: 11, band: 'high' });
  });

  it('answers 422 for a score off the scale or a missing input', async () => {
    const half = await new Client(ctx.app).get('/api/v1/calc/abc-risk?a=3.3&b=3&c=3');
    expect(half.status).toBe(422);
    expect(half.body.error.fields.a).toBe('Between 1 and 5 in steps of 0.5.');
    const missing = await new Client(ctx.app).get('/api/v1/calc/abc-risk?a=3&b=3');
    expect(missing.body.error).toMatchObject({ code: 'unprocessable', fields: { c: 'Missing.' } });
    const zero = await new Client(ctx.app).get('/api/v1/calc/abc-risk?yearsBetween=0&b=3&c=3');
    expect(zero.body.error.fields.yearsBetween).toBe('Years between events must be more than 0.');
  });
});
