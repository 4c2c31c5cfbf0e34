import { intakeFormText, lengthText, parseIntakeForm, type IntakeFormText } from '@/components/remote/intake-form-values';

const form = (patch: Partial<IntakeFormText> = {}): IntakeFormText => ({
  handedness: 'left',
  height: '180',
  wristToFloor: '86',
  handicap: '12.4',
  usualMiss: '',
  ballFlightNow: '',
  ballFlightWanted: '',
  wishes: '',
  ...patch,
});

// 1 in = 2.54 cm exactly (International Yard and Pound Agreement, 1959).
describe('parseIntakeForm', () => {
  it('parseIntakeForm, 72 in and 34 in typed in inches, sends 182.88 cm and 86.36 cm', () => {
    const r = parseIntakeForm(form({ height: '72', wristToFloor: '34' }), 'in');
    expect(r.ok).toBe(true);
    if (r.ok) {
      expect(r.body.heightCm).toBeCloseTo(182.88, 9);
      expect(r.body.wristToFloorCm).toBeCloseTo(86.36, 9);
    }
  });

  it('parseIntakeForm, a 3 m player (300 cm), refuses the height field', () => {
    const r = parseIntakeForm(form({ height: '300' }), 'cm');
    expect(r).toMatchObject({ ok: false, errors: { height: expect.stringMatching(/230 cm/) } });
  });

  it('parseIntakeForm, wrist-to-floor longer than the height, refuses the wrist-to-floor field only', () => {
    const r = parseIntakeForm(form({ height: '110', wristToFloor: '115' }), 'cm');
    expect(r.ok).toBe(false);
    if (!r.ok) expect(Object.keys(r.errors)).toEqual(['wristToFloor']);
  });

  it('parseIntakeForm, handicap 60 and a plus handicap +11, are refused; +4 is stored as −4', () => {
    expect(parseIntakeForm(form({ handicap: '60' }), 'cm')).toMatchObject({ ok: false, errors: { handicap: expect.any(String) } });
    expect(parseIntakeForm(form({ handicap: '+11' }), 'cm')).toMatchObject({ ok: false, errors: { handicap: expect.any(String) } });
    expect(parseIntakeForm(form({ handicap: '+4' }), 'cm')).toMatchObject({ ok: true, body: { handicap: -4 } });
  });

  it('parseIntakeForm, a height that is not a number, names the height field', () => {
    expect(parseIntakeForm(form({ height: 'tall' }), 'cm')).toMatchObject({ ok: false, errors: { height: 'Enter a number, or leave it blank.' } });
  });
});

describe('intakeFormText', () => {
  it('intakeFormText, a profile of 182.88 cm shown in inches, reads 72', () => {
    expect(lengthText(182.88, 'in')).toBe('72');
    expect(intakeFormText('cm', null, null).handedness).toBe('right');
  });
});
