import { isShotKept } from '@/analysis/strays';

describe('isShotKept', () => {
  it('isShotKept on a stray without a decision leaves it out by default', () => {
    expect(isShotKept({ flagged: true })).toBe(false);
  });
  it('isShotKept on a shot flagged only for review keeps it', () => {
    expect(isShotKept({ flagged: true, reviewOnly: true })).toBe(true);
  });
  it('isShotKept on a shot for review that the fitter dropped leaves it out', () => {
    expect(isShotKept({ flagged: true, reviewOnly: true, decision: 'drop' })).toBe(false);
  });
  it('isShotKept on a stray with includeStrays keeps it', () => {
    expect(isShotKept({ flagged: true, includeStrays: true })).toBe(true);
  });
  it('isShotKept with the fitter’s keep keeps a stray', () => {
    expect(isShotKept({ flagged: true, decision: 'keep' })).toBe(true);
  });
  it('isShotKept with the fitter’s drop drops a good shot even when strays are included', () => {
    expect(isShotKept({ flagged: false, decision: 'drop', includeStrays: true })).toBe(false);
  });
  it('isShotKept on a good shot keeps it', () => {
    expect(isShotKept({ flagged: false })).toBe(true);
  });
});
