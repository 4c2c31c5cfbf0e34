/**
 * The stray rules against invented sessions with known injected mishits (fixtures/sessions/):
 * the targets of the product's stray rules. Clear mishits are defined in
 * fixtures/sessions/stray-validation.ts, apart from the rules; `node --import tsx
 * scripts/stray-validation.ts` prints the same figures in full.
 */
import { runStrayValidation } from '@/fixtures/sessions/stray-validation';

jest.setTimeout(120_000);

describe('stray rules on realistic generated sessions', () => {
  const figures = [runStrayValidation({ seed: 2, groupsPerCell: 40 }), runStrayValidation({ seed: 5, groupsPerCell: 40 })];

  it('stray rules on generated sessions catch every clear mishit of every kind', () => {
    for (const f of figures) {
      for (const [kind, t] of Object.entries(f.byKind)) {
        expect({ kind, caught: t.clearCaught }).toEqual({ kind, caught: t.clear });
        expect(t.clear).toBeGreaterThan(20); // the kind was tried often enough to mean something
      }
    }
  });

  it('stray rules on generated sessions flag at most one normal shot in fifty, none for being better', () => {
    for (const f of figures) {
      expect(f.normal.shots).toBeGreaterThan(5000);
      expect(f.normal.flagged / f.normal.shots).toBeLessThanOrEqual(1 / 50);
      expect(f.normal.forBeingBetter).toBe(0);
    }
  });
});
