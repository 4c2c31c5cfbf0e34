import { matchHeaderName, parseHeader } from '@/analysis/import';

describe('parseHeader', () => {
  it.each([
    ['Carry (m)', 'carry', 'm', null],
    ['Ball Speed [km/h]', 'ball speed', 'km/h', null],
    ['Carry yds', 'carry', 'yd', null],
    ['Ball Speed mph', 'ball speed', 'mph', null],
    ['Launch Angle (°)', 'launch angle', 'deg', null],
    ['Apex Height (ft)', 'apex height', 'ft', null],
    ['Spin Rate (rpm)', 'spin rate', 'rpm', null],
    ['Offline (m, L-/R+)', 'offline', 'm', 'signed-right-positive'],
    ['Offline (m, left +)', 'offline', 'm', 'signed-left-positive'],
    ['Club Path (deg L+/R-)', 'club path', 'deg', 'signed-left-positive'],
    ['Side (R+)', 'side', null, 'signed-right-positive'],
    ['Side (+ = left)', 'side', null, 'signed-left-positive'],
    ['Offline (L/R)', 'offline', null, 'lettered'],
    ['Face-to-Path', 'face to path', null, null],
    ['Shot #', 'shot', null, null],
  ])('parseHeader of "%s" gives name "%s", unit %s, side %s', (header, name, unit, side) => {
    const parsed = parseHeader(header);
    expect({ name: parsed.name, unit: parsed.unit?.unit ?? null, side: parsed.side }).toEqual({ name, unit, side });
  });

  it('parseHeader of an unknown bracketed unit reports it', () => {
    expect(parseHeader('Carry (furlongs)')).toMatchObject({ name: 'carry', unit: null, unknownUnit: 'furlongs' });
  });
});

describe('matchHeaderName', () => {
  it.each([
    ['ball speed', 'ballSpeed'], ['club head speed', 'clubSpeed'], ['smash', 'smashFactor'], ['vertical launch', 'launchAngle'],
    ['horizontal launch', 'launchDirection'], ['total spin', 'spinRate'], ['back spin', 'backSpin'], ['side spin', 'sideSpin'],
    ['spin axis', 'spinAxis'], ['angle of attack', 'attackAngle'], ['club path', 'clubPath'], ['face angle', 'faceAngle'],
    ['face to path', 'faceToPath'], ['dynamic loft', 'dynamicLoft'], ['spin loft', 'spinLoft'], ['carry distance', 'carry'],
    ['total distance', 'total'], ['carry side', 'offline'], ['peak height', 'apexHeight'], ['landing angle', 'descentAngle'],
    ['hang time', 'flightTime'], ['club', 'club'], ['shaft', 'build'], ['head', 'build'], ['tag', 'build'], ['shot', 'ignore'],
    ['total side', 'ignore'], ['carrry', 'carry'], ['ball speed avg', 'ballSpeed'],
  ])('matchHeaderName of "%s" gives %s first', (name, target) => {
    expect(matchHeaderName(name)[0]?.target).toBe(target);
  });

  it('matchHeaderName of an exact phrase is more confident than of a near spelling', () => {
    expect(matchHeaderName('carry')[0].confidence).toBeGreaterThan(matchHeaderName('carrry')[0].confidence);
  });

  it('matchHeaderName of an unrelated word gives nothing', () => {
    expect(matchHeaderName('weather')).toEqual([]);
  });
});
