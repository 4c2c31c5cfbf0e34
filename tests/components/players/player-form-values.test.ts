import { handicapText, parseHandicapText, parsePlayerForm, playerFormText } from '@/components/players/player-form-values';

const base = { ...playerFormText(), name: 'Ivo Test' };

describe('parsePlayerForm', () => {
  it('parsePlayerForm, blank optional fields, sends nulls', () => {
    const result = parsePlayerForm(base);
    expect(result).toEqual({
      ok: true,
      body: {
        name: 'Ivo Test',
        email: null,
        handedness: 'right',
        heightCm: null,
        wristToFloorCm: null,
        handicap: null,
        usualMiss: null,
        goals: null,
      },
    });
  });

  it('parsePlayerForm, numbers as text with a decimal comma, parses them', () => {
    const result = parsePlayerForm({ ...base, heightCm: '181,5', wristToFloorCm: '86', handicap: '12.3' });
    expect(result.ok && result.body).toMatchObject({ heightCm: 181.5, wristToFloorCm: 86, handicap: 12.3 });
  });

  it('parsePlayerForm, plus handicap, stores it negative', () => {
    // The R&A and USGA, Rules of Handicapping (2020): a Handicap Index better than scratch is
    // written with a plus sign ("+1.5"); stored here as −1.5. From memory.
    const result = parsePlayerForm({ ...base, handicap: '+1.5' });
    expect(result.ok && result.body.handicap).toBe(-1.5);
  });

  it('parsePlayerForm, height outside the shared schema range, reports that field', () => {
    // The range (100–230 cm) is the shared contract in server/schemas/players.ts.
    const result = parsePlayerForm({ ...base, heightCm: '45' });
    expect(result.ok).toBe(false);
    if (!result.ok) expect(Object.keys(result.errors)).toEqual(['heightCm']);
  });

  it('parsePlayerForm, no name, bad e-mail and a word for a number, reports all three', () => {
    const result = parsePlayerForm({ ...base, name: '  ', email: 'not-an-address', wristToFloorCm: 'long' });
    expect(result.ok).toBe(false);
    if (!result.ok) expect(Object.keys(result.errors).sort()).toEqual(['email', 'name', 'wristToFloorCm']);
  });
});

describe('handicapText', () => {
  it('handicapText, stored plus handicap, round-trips through parseHandicapText', () => {
    expect(handicapText(-2.4)).toBe('+2.4');
    expect(parseHandicapText(handicapText(-2.4))).toBe('-2.4');
    expect(handicapText(18)).toBe('18');
    expect(handicapText(null)).toBe('');
  });
});
