/** One recorded change of a bag club: the club's whole state after the change. */
export interface BagHistoryEntry<S extends { status: string }> {
  bagClubId: string;
  /** When the change was recorded (ISO 8601, UTC, as Date.toISOString writes it). */
  changedAt: string;
  /** Order of recording, for changes within one millisecond. */
  seq: number;
  snapshot: S;
}

/**
 * The bag as recorded before `beforeIso` (e.g. the start of the day after the date asked for):
 * per bag club the state of its latest change before then, leaving out clubs that were out.
 * Pass entries in any order. O(n).
 * @example bagAsOf(entries, '2026-06-02T00:00:00.000Z').length // => the clubs in the bag at the end of 1 June 2026
 */
export function bagAsOf<S extends { status: string }>(entries: readonly BagHistoryEntry<S>[], beforeIso: string): S[] {
  const latest = new Map<string, BagHistoryEntry<S>>();
  for (const e of entries) {
    if (!(e.changedAt < beforeIso)) continue;
    const seen = latest.get(e.bagClubId);
    if (!seen || e.changedAt > seen.changedAt || (e.changedAt === seen.changedAt && e.seq > seen.seq)) latest.set(e.bagClubId, e);
  }
  return [...latest.values()].map((e) => e.snapshot).filter((s) => s.status !== 'out');
}
