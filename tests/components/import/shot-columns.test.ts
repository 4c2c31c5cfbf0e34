import type { Shot } from '@/analysis/fields';
import { formatShotValue, previewColumns } from '@/components/import/shot-columns';
import { formatFileSize, summarizeSkipped } from '@/components/import/import-words';

const shot = (values: Shot['values']): Shot => ({ row: 1, club: '7I', build: null, values, derived: [] });

describe('formatShotValue', () => {
  it('formatShotValue, 137.16 m carry in imperial units, is 150.0 yd', () => {
    // 1 yd = 0.9144 m exactly (NIST SP 811, 2008, Appendix B.8): 150 yd = 137.16 m.
    expect(formatShotValue(shot({ carry: 137.16 }), 'carry', 'imperial')).toBe('150.0');
  });

  it('formatShotValue, 44.704 m/s ball speed, is 100.0 mph and 160.9 km/h', () => {
    // 1 mph = 0.44704 m/s exactly, 1 km/h = 1/3.6 m/s (NIST SP 811, 2008, Appendix B.8).
    expect(formatShotValue(shot({ ballSpeed: 44.704 }), 'ballSpeed', 'imperial')).toBe('100.0');
    expect(formatShotValue(shot({ ballSpeed: 44.704 }), 'ballSpeed', 'metric')).toBe('160.9');
  });

  it('formatShotValue, a negative offline, is written with L (+ is right)', () => {
    expect(formatShotValue(shot({ offline: -4.1 }), 'offline', 'metric')).toBe('4.1 L');
    expect(formatShotValue(shot({ offline: 2 }), 'offline', 'metric')).toBe('2.0 R');
    expect(formatShotValue(shot({ offline: 0.01 }), 'offline', 'metric')).toBe('0.0');
  });

  it('formatShotValue, a spin axis tilted left, is written with L like offline', () => {
    expect(formatShotValue(shot({ spinAxis: -6.2 }), 'spinAxis', 'metric')).toBe('6.2 L');
  });

  it('formatShotValue, a missing field, is a dash', () => {
    expect(formatShotValue(shot({}), 'carry', 'metric')).toBe('–');
  });
});

describe('previewColumns', () => {
  it('previewColumns, shots with every preview field, keeps offline and launch direction (no cap at five)', () => {
    const cols = previewColumns(
      [shot({ ballSpeed: 60, clubSpeed: 42, launchAngle: 12, launchDirection: 1, spinRate: 3000, spinAxis: 2, carry: 200, offline: -3, total: 215 })],
      'metric',
    );
    expect(cols.map((c) => c.field)).toEqual(['carry', 'offline', 'total', 'launchDirection', 'spinAxis', 'ballSpeed', 'clubSpeed', 'launchAngle', 'spinRate']);
  });

  it('previewColumns, shots with carry and spin only, shows just those with display units', () => {
    const cols = previewColumns([shot({ carry: 150 }), shot({ spinRate: 6000 })], 'imperial');
    expect(cols.map((c) => [c.field, c.unit])).toEqual([
      ['carry', 'yd'],
      ['spinRate', 'rpm'],
    ]);
  });
});

describe('import words', () => {
  it('summarizeSkipped, lines of two reasons, counts each with its lines', () => {
    expect(summarizeSkipped([{ line: 2, reason: 'units row' }, { line: 14, reason: 'summary row' }, { line: 15, reason: 'summary row' }])).toEqual([
      '1 units row (line 2)',
      '2 summary rows (lines 14, 15)',
    ]);
  });

  it('formatFileSize, SI prefixes (BIPM SI Brochure, 9th ed., 2019, table 7: k = 10^3, M = 10^6)', () => {
    expect(formatFileSize(999)).toBe('999 bytes');
    expect(formatFileSize(12_400)).toBe('12.4 kB');
    expect(formatFileSize(1_300_000)).toBe('1.3 MB');
  });
});
