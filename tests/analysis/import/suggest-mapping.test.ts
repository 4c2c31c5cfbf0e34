import { suggestMapping } from '@/analysis/import';

function suggestionFor(text: string, header: string) {
  const s = suggestMapping(text).suggestions.find((x) => x.header === header);
  if (!s) throw new Error(`no suggestion for ${header}`);
  return s;
}

describe('suggestMapping', () => {
  it('suggestMapping gives every column a target, a confidence, a reason and samples', () => {
    const result = suggestMapping('Club,Carry (yds),Weather\n7 Iron,165.2,dry\n7 Iron,163.0,dry\n');
    expect(result.suggestions.map((s) => s.field)).toEqual(['club', 'carry', 'ignore']);
    for (const s of result.suggestions) {
      expect(s.confidence).toBeGreaterThan(0);
      expect(s.confidence).toBeLessThanOrEqual(1);
      expect(s.reason.length).toBeGreaterThan(0);
    }
    expect(result.suggestions[1].samples).toEqual(['165.2', '163.0']);
  });

  it('suggestMapping reads a unit from the units row', () => {
    expect(suggestionFor('Club\tCarry\tApex\n\tyds\tft\n7 Iron\t165\t90\n', 'Apex')).toMatchObject({ field: 'apexHeight', unit: 'ft' });
  });

  it('suggestMapping of a speed with no unit guesses one and lists it as ambiguous', () => {
    const text = 'Club,Ball Speed\n7 Iron,112.4\n7 Iron,111.9\n';
    const result = suggestMapping(text);
    expect(result.suggestions[1]).toMatchObject({ field: 'ballSpeed', unit: 'mph' });
    expect(result.ambiguous.map((a) => a.column)).toContain('Ball Speed');
  });

  it('suggestMapping of a distance with no unit follows the other columns', () => {
    expect(suggestionFor('Club,Ball Speed (km/h),Carry\n7 Iron,180.2,150.1\n', 'Carry')).toMatchObject({ unit: 'm' });
    expect(suggestionFor('Club,Ball Speed (mph),Carry\n7 Iron,112.0,165.1\n', 'Carry')).toMatchObject({ unit: 'yd' });
  });

  it('suggestMapping of signed side values without a stated sign assumes + right and says so', () => {
    const result = suggestMapping('Club,Offline (m)\n7 Iron,-3.2\n7 Iron,2.1\n');
    expect(result.suggestions[1]).toMatchObject({ field: 'offline', side: 'signed-right-positive' });
    expect(result.ambiguous.some((a) => a.column === 'Offline (m)')).toBe(true);
  });

  it('suggestMapping of L/R values gives the lettered notation', () => {
    expect(suggestionFor('Club,Offline (m)\n7 Iron,3.2 L\n7 Iron,2.1 R\n', 'Offline (m)').side).toBe('suffix-LR');
    expect(suggestionFor('Club,Offline (m)\n7 Iron,L 3.2\n7 Iron,R 2.1\n', 'Offline (m)').side).toBe('prefix-LR');
  });

  it('suggestMapping gives a field to one column only and lists the other as ambiguous', () => {
    const result = suggestMapping('Club,Carry (yds),Carry (yds)\n7 Iron,165,165\n');
    expect(result.suggestions.map((s) => s.field)).toEqual(['club', 'carry', 'ignore']);
    expect(result.warnings.map((w) => w.code)).toContain('DUPLICATE_HEADER');
    expect(result.ambiguous.map((a) => a.column)).toContain('Carry (yds) (2)');
  });

  it('suggestMapping of an unknown unit keeps it as written and warns', () => {
    const result = suggestMapping('Club,Carry (furlongs)\n7 Iron,0.75\n');
    expect(result.suggestions[1]).toMatchObject({ field: 'carry', unit: 'furlongs' });
    expect(result.warnings).toContainEqual(expect.objectContaining({ code: 'UNKNOWN_UNIT', column: 'Carry (furlongs)' }));
  });

  it('suggestMapping recognises a club column by its values when the header says nothing', () => {
    expect(suggestionFor('Stick,Carry (m)\n7 Iron,150\nDriver,230\nPW,110\n', 'Stick').field).toBe('club');
  });

  it('suggestMapping without a club column warns', () => {
    expect(suggestMapping('Carry (m),Spin (rpm)\n150,6500\n').warnings.map((w) => w.code)).toContain('NO_CLUB_COLUMN');
  });

  it('suggestMapping gives a recipe that holds every column', () => {
    const result = suggestMapping('Club;Carry (m)\n7 Iron;150,2\n');
    expect(result.recipe).toEqual({
      delimiter: ';',
      decimal: ',',
      headerRow: 0,
      columns: { Club: { field: 'club' }, 'Carry (m)': { field: 'carry', unit: 'm' } },
    });
  });
});

// The ranges behind these warnings bracket the product's own examples (7 iron ~50 m/s, ~150 m;
// driver ~70 m/s, ~230 m); common practice, no source.
describe('suggestMapping unit warnings', () => {
  it('speeds that look like km/h labelled mph raise UNIT_SUSPECT', () => {
    // a driver at 70 m/s is 252 km/h; read as mph that would be 112.7 m/s
    const text = 'Club,Ball Speed (mph),Carry (m)\nDriver,252.1,231.0\nDriver,249.8,228.4\nDriver,254.0,233.9\n';
    const warning = suggestMapping(text).warnings.find((w) => w.code === 'UNIT_SUSPECT');
    expect(warning).toMatchObject({ column: 'Ball Speed (mph)' });
    expect(warning!.message).toMatch(/km\/h/);
  });

  it('ball and club speeds in units that do not fit together raise UNIT_SUSPECT', () => {
    // ball 50 m/s written as 180 km/h, club 37.5 m/s written as 83.9 mph, both labelled mph
    const text = 'Club,Ball Speed (mph),Club Speed (mph)\n7 Iron,180.2,83.9\n7 Iron,179.4,83.5\n';
    expect(suggestMapping(text).warnings.map((w) => w.code)).toContain('UNIT_SUSPECT');
  });

  it('a carry in yards among metric columns raises UNIT_MIXED', () => {
    const text = 'Club,Ball Speed (m/s),Club Speed (m/s),Carry (yds),Apex (m)\n7 Iron,50.1,37.5,150.2,28.1\n';
    expect(suggestMapping(text).warnings).toContainEqual(expect.objectContaining({ code: 'UNIT_MIXED', column: 'Carry (yds)' }));
  });

  it('consistent plausible units raise no unit warning', () => {
    const text = 'Club,Ball Speed (mph),Club Speed (mph),Carry (yds)\n7 Iron,112.1,84.6,164.2\nDriver,157.9,107.2,252.4\n';
    expect(suggestMapping(text).warnings.filter((w) => w.code.startsWith('UNIT'))).toEqual([]);
  });
});
