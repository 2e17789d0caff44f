import { describe, expect, it } from 'vitest';
import { abcRisk, bandRange, isHalfStepScore, scoreA, scoreB, scoreC } from '../../shared/calc/abc-risk.js';
import { gradeFromFindings } from '../../shared/calc/condition-grade.js';
import { rustGrade, rustGradeRange } from '../../shared/calc/rust-grade.js';

// ASTM D610-08 (reapproved 2019), "Standard Practice for Evaluating Degree of Rusting on Painted
// Steel Surfaces", Table 1: each grade's upper bound belongs to it; a hair above goes to the next.
describe('rust grade (ASTM D610-08 R2019, Table 1)', () => {
  const TABLE: [grade: number, upTo: number][] = [
    [10, 0.01],
    [9, 0.03],
    [8, 0.1],
    [7, 0.3],
    [6, 1],
    [5, 3],
    [4, 10],
    [3, 16],
    [2, 33],
    [1, 50],
  ];
  it.each(TABLE)('grade %i runs up to %f %% inclusive', (grade, upTo) => {
    expect(rustGrade(upTo).grade).toBe(grade);
    expect(rustGrade(upTo + 1e-9).grade).toBe(grade - 1);
  });

  it('gives 10 for a clean surface and 0 above 50 %', () => {
    expect(rustGrade(0).grade).toBe(10);
    expect(rustGrade(50.0001).grade).toBe(0);
    expect(rustGrade(100)).toMatchObject({ grade: 0, above: 50, upTo: null });
  });

  it('writes the distribution after the grade and names the range', () => {
    const g = rustGrade(2, 'G');
    expect(g.label).toBe('5-G');
    expect(rustGradeRange(g)).toBe('more than 1 % up to 3 %');
    expect(rustGradeRange(rustGrade(0.005))).toBe('up to 0.01 %');
    expect(rustGradeRange(rustGrade(70))).toBe('more than 50 %');
  });

  it.each([-0.1, 100.1, Number.NaN])('refuses %f %%', (p) => {
    expect(() => rustGrade(p)).toThrow(RangeError);
  });
});

// Michalski & Pedersoli, The ABC Method (CCI and ICCROM, 2016). The scale anchors (A 5 ≈ once a
// year, 4 ≈ once in 10 years, 3 ≈ once in 100; B and C 5 = 100 %, 4 = 10 %, 3 = 1 %, 2 = 0.1 %,
// 1 = 0.01 %) are as listed in REFERENCES.md from memory; the bands are from memory too (no page
// cited: the manual was not at hand).
describe('ABC risk scores', () => {
  it.each([
    [1, 5],
    [10, 4],
    [100, 3],
    [1000, 2],
    [10000, 1],
    [3, 4.5],
    [30, 3.5],
    [0.5, 5],
    [1e6, 1],
  ])('A for once every %f years is %f', (years, a) => {
    expect(scoreA(years)).toBe(a);
  });

  it.each([
    [100, 5],
    [10, 4],
    [1, 3],
    [0.1, 2],
    [0.01, 1],
    [30, 4.5],
    [3, 3.5],
    [0.001, 1],
  ])('B and C for %f %% are %f', (percent, score) => {
    expect(scoreB(percent)).toBe(score);
    expect(scoreC(percent)).toBe(score);
  });

  it('refuses inputs off the scales', () => {
    expect(() => scoreA(0)).toThrow(RangeError);
    expect(() => scoreB(0)).toThrow(RangeError);
    expect(() => scoreC(101)).toThrow(RangeError);
    expect(() => abcRisk(5.5, 3, 3)).toThrow(/A must be between 1 and 5 in steps of 0.5/);
    expect(() => abcRisk(3, 3.3, 3)).toThrow(/B must/);
    expect(isHalfStepScore(2.5)).toBe(true);
    expect(isHalfStepScore(0.5)).toBe(false);
  });

  it('adds A, B and C into MR and names its band at each boundary', () => {
    expect(abcRisk(5, 5, 5)).toMatchObject({ magnitude: 15, band: 'extreme' });
    expect(abcRisk(4.5, 4.5, 4.5).band).toBe('extreme'); // 13.5
    expect(abcRisk(4.5, 4.5, 4).band).toBe('very-high'); // 13
    expect(abcRisk(4, 4, 3.5).band).toBe('very-high'); // 11.5
    expect(abcRisk(4, 4, 3).band).toBe('high'); // 11
    expect(abcRisk(3.5, 3, 3).band).toBe('high'); // 9.5
    expect(abcRisk(3, 3, 3).band).toBe('medium'); // 9
    expect(abcRisk(2.5, 2.5, 2.5).band).toBe('medium'); // 7.5
    expect(abcRisk(2.5, 2.5, 2).band).toBe('low'); // 7
    expect(abcRisk(1, 1, 1)).toMatchObject({ magnitude: 3, band: 'low' });
    expect(bandRange('high')).toBe('MR 9.5–11');
    expect(bandRange('extreme')).toBe('MR 13.5–15');
  });
});

// Our own grade rule (common practice, no published source), as the screen states it.
describe('condition grade from findings', () => {
  const f = (severity: 'slight' | 'moderate' | 'severe' | 'critical', extentPercent: number | null = null) => ({ severity, extentPercent });
  it('follows the rule line by line', () => {
    expect(gradeFromFindings([])).toMatchObject({ grade: 'good', ruleLine: 3 });
    expect(gradeFromFindings([f('slight', 4), f('slight', 6)])).toMatchObject({ grade: 'good' });
    expect(gradeFromFindings([f('slight', 4), f('slight', 6.5)])).toMatchObject({ grade: 'fair', because: 'Slight findings cover 10.5 % together.' });
    expect(gradeFromFindings([f('moderate')])).toMatchObject({ grade: 'fair', ruleLine: 2 });
    expect(gradeFromFindings([f('moderate'), f('moderate')]).grade).toBe('fair');
    expect(gradeFromFindings([f('moderate'), f('moderate'), f('moderate')])).toMatchObject({ grade: 'poor', ruleLine: 1 });
    expect(gradeFromFindings([f('slight'), f('severe')])).toMatchObject({ grade: 'poor', because: '1 severe finding.' });
    expect(gradeFromFindings([f('severe'), f('critical')])).toMatchObject({ grade: 'critical', ruleLine: 0 });
  });
});
