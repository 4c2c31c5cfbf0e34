import { bagAsOf, type BagHistoryEntry } from '@/analysis/bag';

type S = { id: string; status: 'in-bag' | 'on-order' | 'out'; loftDeg: number };
const e = (bagClubId: string, changedAt: string, seq: number, status: S['status'], loftDeg = 10): BagHistoryEntry<S> => ({
  bagClubId,
  changedAt,
  seq,
  snapshot: { id: bagClubId, status, loftDeg },
});

const history = [
  e('dr', '2026-01-10T09:00:00.000Z', 1, 'in-bag', 10.5),
  e('7i', '2026-01-10T09:00:00.000Z', 2, 'in-bag', 31),
  e('dr', '2026-05-01T12:00:00.000Z', 3, 'in-bag', 11.5),
  e('7i', '2026-06-01T08:00:00.000Z', 4, 'out', 31),
  e('7h', '2026-06-01T08:00:00.000Z', 5, 'on-order', 31),
];

describe('bagAsOf', () => {
  it('bagAsOf before anything was recorded is empty', () => {
    expect(bagAsOf(history, '2026-01-10T00:00:00.000Z')).toEqual([]);
  });

  it('bagAsOf takes each club’s latest state before the moment', () => {
    const bag = bagAsOf(history, '2026-05-02T00:00:00.000Z');
    expect(bag.map((c) => [c.id, c.loftDeg]).sort()).toEqual([['7i', 31], ['dr', 11.5]]);
  });

  it('bagAsOf leaves out clubs that had gone out and keeps clubs on order', () => {
    const bag = bagAsOf(history, '2026-07-01T00:00:00.000Z');
    expect(bag.map((c) => c.id).sort()).toEqual(['7h', 'dr']);
  });

  it('bagAsOf of two changes at the same moment keeps the later recorded', () => {
    const same = [e('x', '2026-02-01T00:00:00.000Z', 8, 'out'), e('x', '2026-02-01T00:00:00.000Z', 7, 'in-bag')];
    expect(bagAsOf(same, '2026-03-01T00:00:00.000Z')).toEqual([]);
  });
});
