import { describe, expect, it } from 'vitest';
import { exampleAction, HAZARD_CAUTIONS, workCautions } from '../../shared/hazard-cautions.js';
import { HAZARD_KINDS } from '../../shared/schemas/hazards.js';

// The wording is common practice, no published source; these tests check when each caution applies.
describe('hazard cautions', () => {
  it('every hazard kind has its own caution that defers to the site safety plan and local codes', () => {
    const texts = HAZARD_KINDS.map((k) => HAZARD_CAUTIONS[k]);
    expect(new Set(texts).size).toBe(HAZARD_KINDS.length);
    for (const text of texts) expect(text).toMatch(/site safety plan and local codes/);
  });

  it('cautions abrasive or hot work on lead paint, and not gentle work', () => {
    for (const action of ['Wire-brush, prime and topcoat', 'Sand back to sound paint', 'scrape loose paint', 'Needle-gun the scale', 'Remove with a heat gun'])
      expect(workCautions(['lead-paint'], 'coating-failure', action).map((c) => c.kind), action).toEqual(['lead-paint']);
    expect(workCautions(['lead-paint'], 'coating-failure', 'Clean with a damp cloth and monitor')).toEqual([]);
    expect(workCautions([], 'coating-failure', 'Wire-brush, prime and topcoat')).toEqual([]);
  });

  it('cautions any work on lagging where asbestos is recorded', () => {
    expect(workCautions(['asbestos'], 'lagging-damage', 'Monitor').map((c) => c.kind)).toEqual(['asbestos']);
    expect(workCautions(['asbestos'], 'coating-failure', 'Re-lag the steam line').map((c) => c.kind)).toEqual(['asbestos']);
    expect(workCautions(['asbestos'], 'coating-failure', 'Touch up the paint')).toEqual([]);
    expect(workCautions([], 'lagging-damage', 'Re-lag the steam line')).toEqual([]);
  });

  it('cautions entry wherever a confined space is recorded', () => {
    expect(workCautions(['confined-space'], 'graffiti', 'Clean').map((c) => c.kind)).toEqual(['confined-space']);
  });

  it('never suggests abrasive work where lead is recorded', () => {
    expect(exampleAction([], 'coating-failure')).toMatch(/Wire-brush/);
    const withLead = exampleAction(['lead-paint'], 'coating-failure');
    expect(workCautions(['lead-paint'], 'coating-failure', withLead)).toEqual([]);
    expect(exampleAction(['asbestos'], 'lagging-damage')).toMatch(/licensed abatement contractor/);
  });
});
