import { impactMisreadReason, importBayFile } from '@/analysis/import';

describe('impactMisreadReason', () => {
  // Penner (2003) impact model with the rules' limits (analysis/physics): a driver cannot give 1.62.
  it('impactMisreadReason on a driver at 1.62 says it is a misread, naming the bound', () => {
    expect(impactMisreadReason('DR', 1.62)).toMatch(/^smash factor 1\.62 is more than the impact of a driver allows \(at most 1\.5\d with 3% for measurement error\): a misread, not a shot$/);
  });
  it('impactMisreadReason on a 7-iron at 1.34 or a putter at 1.9 gives null', () => {
    expect(impactMisreadReason('7I', 1.34)).toBeNull();
    expect(impactMisreadReason('PT', 1.9)).toBeNull();
  });
});

describe('importBayFile with the impact bound', () => {
  it('importBayFile rejects a row whose derived smash factor is beyond the impact bound, with its row and reason', () => {
    const csv = ['Club,Club Speed (mph),Ball Speed (mph),Carry (yds)', 'Driver,100,147,240', 'Driver,90,142,245', 'Driver,101,148,242'].join('\n');
    const r = importBayFile(csv);
    expect(r.shots.map((s) => s.row)).toEqual([1, 3]);
    expect(r.rejected).toEqual([expect.objectContaining({ row: 2, reason: expect.stringMatching(/^smash factor 1\.58 is more than the impact of a driver allows/) })]);
  });

  it('importBayFile names the smash factor column when the file gives it', () => {
    const csv = ['Club,Smash,Carry (yds)', 'Sand wedge,1.15,90', 'Sand wedge,1.42,91'].join('\n');
    const r = importBayFile(csv);
    expect(r.rejected).toEqual([expect.objectContaining({ row: 2, column: 'Smash' })]);
  });
});
