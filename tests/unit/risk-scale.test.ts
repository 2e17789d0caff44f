import { describe, expect, it } from 'vitest';
import { abcRisk, bandOf, bandRange, DEFAULT_RISK_SCALE, riskScaleProblems, scoreA, scoreB, type RiskScale } from '../../shared/calc/abc-risk.js';

// The defaults are the ABC method's anchors and bands as remembered (see shared/calc/abc-risk.ts);
// these tests check that the organisation's own values are applied and validated, not the manual.
const scale = (changes: Partial<RiskScale> & { floors?: Partial<RiskScale['bandFloors']> } = {}): RiskScale => ({
  ...DEFAULT_RISK_SCALE,
  ...changes,
  bandFloors: { ...DEFAULT_RISK_SCALE.bandFloors, ...changes.floors },
});

describe('the ABC risk scale of the settings', () => {
  it('keeps the defaults: A 4 at ten years, B 4 at 10 %, bands as before', () => {
    expect(riskScaleProblems(DEFAULT_RISK_SCALE)).toEqual([]);
    expect(scoreA(10)).toBe(4);
    expect(scoreB(10)).toBe(4);
    expect(bandOf(11.5)).toBe('very-high');
    expect(bandRange('high')).toBe('MR 9.5–11');
  });

  it('scores under other anchors: A 5 at 2 years with a factor of 2 gives A 4 at 4 years; B 4 at 50 %', () => {
    const halving = scale({ aYearsAtFive: 2, stepFactor: 2 });
    expect(scoreA(4, halving)).toBe(4); // 5 − log2(4 / 2) = 4
    expect(scoreA(32, halving)).toBe(1); // 5 − log2(16) = 1
    expect(scoreB(50, halving)).toBe(4); // 5 + log2(0.5) = 4
  });

  it('bands a magnitude by the organisation floors', () => {
    const lower = scale({ floors: { medium: 6, high: 8, 'very-high': 10, extreme: 12 } });
    expect(bandOf(12, lower)).toBe('extreme');
    expect(bandOf(11.5, lower)).toBe('very-high');
    expect(abcRisk(3, 3, 2, lower).band).toBe('high');
    expect(bandRange('medium', lower)).toBe('MR 6–7.5');
    expect(bandRange('extreme', lower)).toBe('MR 12–15');
  });

  it('refuses bands that do not rise, leave a gap at the bottom or run past 15, with a message per band', () => {
    expect(riskScaleProblems(scale({ floors: { low: 4 } }))).toEqual([{ field: 'bandFloors.low', message: 'Low priority must start at MR 3, the lowest magnitude, so that every score has a band.' }]);
    expect(riskScaleProblems(scale({ floors: { high: 7.5 } }))).toEqual([{ field: 'bandFloors.high', message: 'High priority must start above medium priority (MR 7.5): the bands rise from low to extreme.' }]);
    expect(riskScaleProblems(scale({ floors: { extreme: 15.5 } }))).toEqual([{ field: 'bandFloors.extreme', message: 'Extreme priority must start at MR 15 or lower, the highest magnitude.' }]);
    expect(riskScaleProblems(scale({ floors: { medium: 7.25 } }))[0]).toEqual({ field: 'bandFloors.medium', message: 'Medium priority must start at a whole or half MR, e.g. 9.5.' });
    expect(riskScaleProblems(scale({ stepFactor: 1, aYearsAtFive: 0 })).map((p) => p.field)).toEqual(['aYearsAtFive', 'stepFactor']);
  });
});
