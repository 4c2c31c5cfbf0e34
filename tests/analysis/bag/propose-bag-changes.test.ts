import { ProposalError, proposeBagChanges, type ProposalBagClub } from '@/analysis/bag';

const bag: ProposalBagClub[] = [
  { id: 'dr', club: 'DR', version: 3, status: 'in-bag' },
  { id: '4i', club: '4I', version: 1, status: 'in-bag' },
  { id: '7i', club: '7I', version: 2, status: 'in-bag' },
  { id: 'old', club: '5W', version: 1, status: 'out' },
];

describe('proposeBagChanges', () => {
  it('proposeBagChanges replaces the club of the same code, adds a new code and takes out what is listed', () => {
    const changes = proposeBagChanges(bag, [
      { buildId: 'b1', club: 'DR', label: 'Loft up' },
      { buildId: 'b2', club: '4H', label: 'Hybrid 22', replacesBagClubId: '4i' },
      { buildId: 'b3', club: '5W', label: 'Wood 18' },
    ], ['7i']);
    expect(changes).toEqual([
      { kind: 'replace', club: 'DR', buildId: 'b1', label: 'Loft up', bagClubId: 'dr', replacedClub: 'DR', version: 3 },
      { kind: 'add', club: '5W', buildId: 'b3', label: 'Wood 18' },
      { kind: 'replace', club: '4H', buildId: 'b2', label: 'Hybrid 22', bagClubId: '4i', replacedClub: '4I', version: 1 },
      { kind: 'take-out', club: '7I', bagClubId: '7i', version: 2 },
    ]);
  });

  it('proposeBagChanges with null adds the build beside the club of the same code', () => {
    expect(proposeBagChanges(bag, [{ buildId: 'b', club: 'DR', label: 'Second driver', replacesBagClubId: null }], [])).toEqual([
      { kind: 'add', club: 'DR', buildId: 'b', label: 'Second driver' },
    ]);
  });

  it('proposeBagChanges does not match a club already out', () => {
    expect(proposeBagChanges(bag, [{ buildId: 'b', club: '5W', label: 'x' }], [])[0].kind).toBe('add');
  });

  it('proposeBagChanges of a club replaced and taken out throws naming takeOut or builds', () => {
    expect(() => proposeBagChanges(bag, [{ buildId: 'b', club: '7I', label: 'x', replacesBagClubId: '7i' }], ['7i'])).toThrow(ProposalError);
    const thrown = (() => {
      try {
        proposeBagChanges(bag, [], ['old']);
        return null;
      } catch (err) {
        return err;
      }
    })();
    expect(thrown).toBeInstanceOf(ProposalError);
    expect((thrown as ProposalError).field).toBe('takeOut');
    expect((thrown as ProposalError).message).toMatch(/not in the bag/);
  });

  it('proposeBagChanges of two builds for one club throws', () => {
    expect(() => proposeBagChanges(bag, [{ buildId: 'a', club: '7I', label: 'a' }, { buildId: 'b', club: '7I', label: 'b' }], [])).toThrow(/one build per club/);
  });
});
