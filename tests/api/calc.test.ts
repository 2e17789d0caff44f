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
    expect(res.body.source).toMatch(/The ABC Method: a risk management approach to the preservation of cultural heritage/);
    expect(res.body.source).not.toMatch(/remembered|memory/);
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

describe('GET /api/v1/calc/saturation', () => {
  // IAPWS R7-97(2012), Table 36: 0.1 MPa → 372.755919 K
  it('gives the boiling point at a pressure in every reading, with its source', async () => {
    const res = await new Client(ctx.app).get('/api/v1/calc/saturation?pressure=100&unit=kPa');
    expect(res.status).toBe(200);
    expect(res.body.temperatureK).toBeCloseTo(372.755919, 5);
    expect(res.body.temperatureC).toBeCloseTo(372.755919 - 273.15, 5);
    expect(res.body.source).toMatch(/IAPWS-IF97/);
    // US customary, computed with IF97 (REFERENCES.md, ±0.1 °F): 1 psia → 101.7 °F
    const psia = await new Client(ctx.app).get('/api/v1/calc/saturation?pressure=1&unit=psia');
    expect(Math.abs(psia.body.temperatureF - 101.7)).toBeLessThanOrEqual(0.1);
    // 0 psig at the standard atmosphere (101 325 Pa, NIST SP 811) is 14.696 psia → 212.0 °F
    const gauge = await new Client(ctx.app).get('/api/v1/calc/saturation?pressure=0&unit=psig');
    expect(Math.abs(gauge.body.temperatureF - 212)).toBeLessThanOrEqual(0.1);
    expect(gauge.body.pressure.psia).toBeCloseTo(14.6959488, 6);
    // the local atmosphere moves a gauge reading: 0 psig at 14 psia is 14 psia absolute
    const local = await new Client(ctx.app).get('/api/v1/calc/saturation?pressure=0&unit=psig&atmosphere=14');
    expect(local.body.pressure.psia).toBeCloseTo(14, 9);
    expect(local.body.temperatureF).toBeLessThan(gauge.body.temperatureF);
  });

  // IAPWS R7-97(2012), Table 35: 500 K → 2.63889776 MPa
  it('gives the saturation pressure at a temperature', async () => {
    const res = await new Client(ctx.app).get(`/api/v1/calc/saturation?temperature=${500 - 273.15}&unit=C`);
    expect(res.status).toBe(200);
    expect(res.body.pressure.MPa).toBeCloseTo(2.63889776, 6);
    expect(res.body.temperatureK).toBeCloseTo(500, 9);
  });

  it('answers 422 naming the range off the saturation line, and 400 for a bad unit', async () => {
    const high = await new Client(ctx.app).get('/api/v1/calc/saturation?pressure=30&unit=MPa');
    expect(high.status).toBe(422);
    expect(high.body.error.fields.pressure).toMatch(/611.213 Pa and 22.064 MPa/);
    const vacuum = await new Client(ctx.app).get('/api/v1/calc/saturation?pressure=31&unit=inHgVac');
    expect(vacuum.status).toBe(422);
    const cold = await new Client(ctx.app).get('/api/v1/calc/saturation?temperature=-5&unit=C');
    expect(cold.status).toBe(422);
    expect(cold.body.error.fields.temperature).toMatch(/273.15 K and 647.096 K/);
    expect((await new Client(ctx.app).get('/api/v1/calc/saturation?unit=psia')).status).toBe(422);
    expect((await new Client(ctx.app).get('/api/v1/calc/saturation?pressure=1&unit=atm')).status).toBe(400);
  });
});

describe('GET /api/v1/calc/convert', () => {
  // 1 US gallon = 231 in³ = 3.785411784 L, exact (NIST SP 811, B.8)
  it('converts within a kind and refuses across kinds', async () => {
    const res = await new Client(ctx.app).get('/api/v1/calc/convert?value=1000&from=gal/d&to=L/d');
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ result: expect.closeTo(3785.411784, 9), dimension: 'volume flow', source: expect.stringMatching(/NIST SP 811/) });
    const bad = await new Client(ctx.app).get('/api/v1/calc/convert?value=1&from=psi&to=kW');
    expect(bad.status).toBe(422);
    expect(bad.body.error.fields.to).toMatch(/do not convert/);
  });
});
