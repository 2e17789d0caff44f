import { describe, expect, it } from 'vitest';
import { boilingLadder, ladderSentences } from '../../shared/calc/boiling-ladder.js';
import { convert } from '../../shared/calc/quantities.js';

describe('boiling ladder', () => {
  // IAPWS R7-97(2012), Table 36: 1 MPa → 453.035632 K, 0.1 MPa → 372.755919 K
  it('boils each stage at its saturation temperature and gives the drop between stages', () => {
    const result = boilingLadder([
      { name: 'Boiler', pressure: 1, reading: 'MPa' },
      { name: 'First effect', pressure: 100, reading: 'kPa' },
    ]);
    if (!result.ok) throw new Error(result.message);
    expect(result.stages[0]!.temperatureK).toBeCloseTo(453.035632, 5);
    expect(result.stages[1]!.temperatureK).toBeCloseTo(372.755919, 5);
    expect(result.stages[1]!.dropK).toBeCloseTo(453.035632 - 372.755919, 5);
    expect(result.stages[0]!.dropK).toBeNull();
  });

  // US customary values computed with IF97 (REFERENCES.md, ±0.1 °F): 14.696 psia → 212.0 °F, 1 psia → 101.7 °F
  it('tells visitors in one sentence why the lower stage boils cooler', () => {
    const result = boilingLadder([
      { name: 'First stage', pressure: 0, reading: 'psig' },
      { name: 'Second stage', pressure: 1, reading: 'psia' },
    ]);
    if (!result.ok) throw new Error(result.message);
    expect(convert(result.stages[1]!.temperatureK, 'K', 'F')).toBeCloseTo(101.7, 0);
    const [first, second] = ladderSentences(result.stages, 'F');
    expect(first).toBe('The first stage boils at 212 °F.');
    expect(second).toBe('The second stage boils at 102 °F because its pressure is lower, so the steam from the first stage, 110 °F hotter, can boil it.');
  });

  it('names the stage whose pressure is off the saturation line instead of giving a number', () => {
    const result = boilingLadder([
      { name: 'Boiler', pressure: 4000, reading: 'psig' },
      { name: 'Condenser', pressure: 29.9, reading: 'inHgVac' },
    ]);
    expect(result).toMatchObject({ ok: false, stage: 0, message: expect.stringMatching(/^Boiler: .*22.064 MPa/) });
  });
});
