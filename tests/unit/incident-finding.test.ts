import { describe, expect, it } from 'vitest';
import { impliedFinding, linesAbout } from '../../shared/calc/incident-finding.js';

// The word lists are common practice, no published source: these check what each wording gives.
describe('the finding an incident implies', () => {
  it('takes the damage from the words, with an agent that can cause it', () => {
    expect(impliedFinding('vandalism', 'Graffiti sprayed on the engine casing')).toEqual({ agent: 'thieves-and-vandals', damageType: 'graffiti' });
    expect(impliedFinding('vandalism', 'Gauge glass smashed')).toEqual({ agent: 'thieves-and-vandals', damageType: 'broken-glass-or-dial' });
    expect(impliedFinding('accident', 'A visitor broke the gauge glass with a bag')).toEqual({ agent: 'physical-forces', damageType: 'broken-glass-or-dial' });
    expect(impliedFinding('theft', 'Brass tag plate missing from the pump')).toEqual({ agent: 'thieves-and-vandals', damageType: 'missing-part' });
    // graffiti cannot come from physical forces: an accident keeps its usual damage
    expect(impliedFinding('accident', 'initials on the rail')).toEqual({ agent: 'physical-forces', damageType: 'impact-damage' });
    expect(impliedFinding('water-ingress', 'Water in the shaft alley')).toEqual({ agent: 'water', damageType: 'water-staining' });
  });

  it('gives each item the lines of the text that name it', () => {
    const text = 'Glass of the steam gauge broken. Initials cut into the ticket counter. Found at opening.';
    expect(linesAbout(text, ['2019.4.12', 'Steam gauge'])).toBe('Glass of the steam gauge broken.');
    expect(linesAbout(text, ['1-45-1-Q', 'Ticket counter'])).toBe('Initials cut into the ticket counter.');
    expect(linesAbout(text, ['Telegraph'])).toBeNull();
    // clauses of one sentence go each to the item they name
    const one = 'Found at opening: the glass of the bulkhead clock broken, initials cut into the ticket counter.';
    expect(linesAbout(one, ['2003.1.3', 'Bulkhead clock'])).toBe('the glass of the bulkhead clock broken');
  });
});
