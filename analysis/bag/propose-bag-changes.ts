import { compareClubs } from '@/analysis/clubs';

/** A club of the bag as the proposal needs it. */
export interface ProposalBagClub {
  id: string;
  club: string;
  version: number;
  status: 'in-bag' | 'on-order' | 'out';
}

/** A build the fitter chose for a club in a fitting. */
export interface ProposalChoice {
  buildId: string;
  club: string;
  label: string;
  /** The bag club it replaces; null to add it beside the others; undefined to let the proposal match one. */
  replacesBagClubId?: string | null;
}

/** One change the proposal makes to a bag. JSON-able. */
export type BagChange =
  | { kind: 'add'; club: string; buildId: string; label: string }
  | { kind: 'replace'; club: string; buildId: string; label: string; bagClubId: string; replacedClub: string; version: number }
  | { kind: 'take-out'; club: string; bagClubId: string; version: number };

/** A choice the proposal cannot make (RangeError message names the problem). */
export class ProposalError extends RangeError {
  constructor(message: string, readonly field: 'builds' | 'takeOut') {
    super(message);
    this.name = 'ProposalError';
  }
}

/**
 * The bag changes that a fitting's chosen builds make: each chosen build replaces the bag club
 * it names, or (when it names none, undefined) the first club of the same code still in the bag
 * or on order, or is added when there is none (or when it says null); the clubs listed in
 * `takeOut` go out. Clubs already out are not part of the bag. In bag order of the club.
 * O((b + c) log (b + c)).
 * @throws ProposalError when a named club is not in the bag, is replaced or taken out twice, or two choices are for one club code
 * @example proposeBagChanges([{ id: 'x', club: '7I', version: 1, status: 'in-bag' }], [{ buildId: 'b', club: '7I', label: 'Steel' }], [])[0].kind // => 'replace'
 */
export function proposeBagChanges(bag: readonly ProposalBagClub[], chosen: readonly ProposalChoice[], takeOut: readonly string[]): BagChange[] {
  const active = new Map(bag.filter((c) => c.status !== 'out').map((c) => [c.id, c]));
  const used = new Set<string>();
  const codes = new Set<string>();
  const changes: BagChange[] = [];
  const claim = (id: string, field: 'builds' | 'takeOut') => {
    if (!active.has(id)) throw new ProposalError('A club to replace or take out is not in the bag (it may have gone out since).', field);
    if (used.has(id)) throw new ProposalError('A bag club is replaced or taken out twice; choose one change for it.', field);
    used.add(id);
    return active.get(id)!;
  };
  for (const id of takeOut) {
    const c = claim(id, 'takeOut');
    changes.push({ kind: 'take-out', club: c.club, bagClubId: c.id, version: c.version });
  }
  // Explicit replacements claim their clubs before the automatic matches look for one.
  const ordered = [...chosen].sort((a, b) => Number(a.replacesBagClubId === undefined) - Number(b.replacesBagClubId === undefined));
  for (const choice of ordered) {
    if (codes.has(choice.club)) throw new ProposalError('Choose one build per club.', 'builds');
    codes.add(choice.club);
    let target: ProposalBagClub | null = null;
    if (typeof choice.replacesBagClubId === 'string') target = claim(choice.replacesBagClubId, 'builds');
    else if (choice.replacesBagClubId === undefined) {
      const match = [...active.values()].find((c) => c.club === choice.club && !used.has(c.id));
      if (match) target = claim(match.id, 'builds');
    }
    if (target) {
      changes.push({ kind: 'replace', club: choice.club, buildId: choice.buildId, label: choice.label, bagClubId: target.id, replacedClub: target.club, version: target.version });
    } else {
      changes.push({ kind: 'add', club: choice.club, buildId: choice.buildId, label: choice.label });
    }
  }
  const kindOrder = { replace: 0, add: 1, 'take-out': 2 } as const;
  return changes.sort((a, b) => compareClubs(a.club, b.club) || kindOrder[a.kind] - kindOrder[b.kind]);
}
