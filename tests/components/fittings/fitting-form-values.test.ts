import { fittingFormText, parseFittingForm } from '@/components/fittings/fitting-form-values';
import { todayIsoDate } from '@/components/format';

const PLAYER_ID = '3f1b6c1e-8a52-4c1e-9a7e-2b0f5d6c7a81'; // invented
const base = { ...fittingFormText(undefined, { playerId: PLAYER_ID, today: '2025-05-14' }) };

describe('parseFittingForm', () => {
  it('parseFittingForm, new indoor fitting with conditions, sends numbers and no fitterId', () => {
    const result = parseFittingForm({ ...base, temperatureC: '21,5', altitudeM: '120', humidityPct: '40', groundFirmness: 'firm' });
    expect(result).toEqual({
      ok: true,
      body: {
        playerId: PLAYER_ID,
        date: '2025-05-14',
        venue: 'indoor',
        temperatureC: 21.5,
        altitudeM: 120,
        humidityPct: 40,
        groundFirmness: 'firm',
        ball: null,
        notes: null,
        remote: false,
      },
    });
  });

  it('parseFittingForm, ground not stated, sends null', () => {
    const result = parseFittingForm(base);
    expect(result.ok && result.body.groundFirmness).toBeNull();
  });

  it('parseFittingForm, 29 February of a leap year, accepts it', () => {
    // Gregorian calendar rule (ISO 8601:2004 §3.2.1): 2024 is a leap year, 2023 is not.
    expect(parseFittingForm({ ...base, date: '2024-02-29' }).ok).toBe(true);
    const bad = parseFittingForm({ ...base, date: '2023-02-29' });
    expect(bad.ok).toBe(false);
    if (!bad.ok) expect(Object.keys(bad.errors)).toEqual(['date']);
  });

  it('parseFittingForm, humidity above 100 %, reports humidity with the schema message', () => {
    // Relative humidity is a percentage of saturation, 0–100 (WMO, Guide to Instruments and
    // Methods of Observation, WMO-No. 8, Part I ch. 4).
    const result = parseFittingForm({ ...base, humidityPct: '104' });
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.errors.humidityPct).toMatch(/0 to 100/);
  });

  it('parseFittingForm, no player chosen, reports the player', () => {
    const result = parseFittingForm({ ...base, playerId: '' });
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.errors.playerId).toBe('Choose a player.');
  });
});

describe('todayIsoDate', () => {
  it('todayIsoDate, a local date, pads month and day', () => {
    expect(todayIsoDate(new Date(2025, 0, 5, 12))).toBe('2025-01-05');
  });
});

describe('fitting form conditions in °F and ft', () => {
  const units = { temperature: 'f', altitude: 'ft' } as const;

  it('parseFittingForm, 68 °F and 1000 ft typed, stores 20 °C and 304.8 m (NIST SP 811 (2008) B.8/B.9: 1 ft = 0.3048 m, °C = (°F − 32)/1.8)', () => {
    const text = { ...fittingFormText(undefined, { playerId: '5b0c7a5e-4f3a-4c1e-9d2a-0e6f1b2c3d4e', today: '2026-11-30' }, units), temperatureC: '68', altitudeM: '1000' };
    const result = parseFittingForm(text, units);
    if (!result.ok) throw new Error(JSON.stringify(result.errors));
    expect(result.body.temperatureC).toBeCloseTo(20, 10);
    expect(result.body.altitudeM).toBeCloseTo(304.8, 10);
  });

  it('fittingFormText, a fitting at 100 °C and 30.48 m, shows 212 and 100', () => {
    const text = fittingFormText({ date: '2026-11-30', temperatureC: 100, altitudeM: 30.48 } as never, {}, units);
    expect(text.temperatureC).toBe('212');
    expect(text.altitudeM).toBe('100');
  });
});
