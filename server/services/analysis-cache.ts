/**
 * Analysis answers computed once per fitting revision and reused until something they depend on
 * changes. The revision lives in MariaDB (fittings.revision, raised in the transaction of each
 * such change: server/services/fitting-revision.ts), so every server process agrees on it; the
 * answers themselves are kept in each process's memory, least recently used first out, within a
 * byte budget. A cached answer is served only after the same access check as a computed one.
 *
 * Key: fitting id, revision, the user's role and units, and every query input. The revision is
 * read before the shots are, so a change that commits in between can only make an entry newer
 * than its key says (the next request, seeing the new revision, computes again), never older.
 */
import { QueryTypes } from 'sequelize';
import { notFound } from '../errors';
import { Fitting } from '../models';
import { type Actor, isStaff } from './actor';
import { prepareJson, type PreparedJson } from './prepared-json';

interface Entry {
  fittingId: string;
  revision: number;
  answer: PreparedJson;
}

/**
 * A bounded least-recently-used map of prepared answers (a Map keeps insertion order: a hit is
 * moved to the end, eviction takes from the front). Sizes are re-read on each insert and hit,
 * since compressed forms are added to an answer after it is stored.
 */
export class AnalysisCache {
  private readonly entries = new Map<string, Entry>();
  private readonly pending = new Map<string, Promise<PreparedJson>>();
  /** The newest revision seen per fitting: older entries of it are dropped on sight. */
  private readonly newest = new Map<string, number>();
  private bytes = 0;
  private readonly sizes = new Map<string, number>();

  constructor(readonly maxBytes: number) {}

  get size(): number {
    return this.entries.size;
  }

  /** Bytes held by the kept answers (bodies and their compressed forms). */
  get heldBytes(): number {
    return this.bytes;
  }

  /**
   * The answer for a key: kept, or being computed by another request (shared), or computed now
   * and kept. A failed computation is not kept.
   */
  async answer(key: string, fittingId: string, revision: number, compute: () => Promise<unknown>): Promise<PreparedJson> {
    this.forgetOlder(fittingId, revision);
    const hit = this.entries.get(key);
    if (hit) {
      this.entries.delete(key);
      this.entries.set(key, hit);
      this.account(key, hit);
      return hit.answer;
    }
    const running = this.pending.get(key);
    if (running) return running;
    const made = (async () => prepareJson(await compute()))();
    this.pending.set(key, made);
    try {
      const answer = await made;
      if ((this.newest.get(fittingId) ?? -1) <= revision) this.store(key, { fittingId, revision, answer });
      return answer;
    } finally {
      this.pending.delete(key);
    }
  }

  private store(key: string, entry: Entry): void {
    // An answer that would take more than half the budget is served but not kept.
    if (entry.answer.bytes() > this.maxBytes / 2) return;
    this.entries.set(key, entry);
    this.account(key, entry);
  }

  private account(key: string, entry: Entry): void {
    const now = entry.answer.bytes();
    this.bytes += now - (this.sizes.get(key) ?? 0);
    this.sizes.set(key, now);
    for (const [oldest] of this.entries) {
      if (this.bytes <= this.maxBytes) break;
      this.drop(oldest);
    }
  }

  private drop(key: string): void {
    this.entries.delete(key);
    this.bytes -= this.sizes.get(key) ?? 0;
    this.sizes.delete(key);
  }

  private forgetOlder(fittingId: string, revision: number): void {
    const seen = this.newest.get(fittingId);
    if (seen !== undefined && seen >= revision) return;
    this.newest.set(fittingId, revision);
    if (seen === undefined) return;
    for (const [key, entry] of this.entries) if (entry.fittingId === fittingId && entry.revision < revision) this.drop(key);
    // The per-fitting marks are few bytes each; keep them bounded all the same.
    if (this.newest.size > 100_000) this.newest.clear();
  }
}

/**
 * The revision of a fitting the actor may see, or 404. The rule is visibleFittings' (staff: their
 * shop's fittings; a player: their own), written as one plain SELECT: through the model's query
 * builder it cost as much server time as the rest of a kept answer (npm run bench, api).
 */
export async function visibleFittingRevision(actor: Actor, fittingId: string): Promise<number> {
  const sql = isStaff(actor)
    ? 'SELECT revision FROM fittings WHERE id = ? AND shop_id = ? LIMIT 1'
    : 'SELECT revision FROM fittings WHERE id = ? AND shop_id = ? AND player_id = ? LIMIT 1';
  const replacements = isStaff(actor) ? [fittingId, actor.shopId] : [fittingId, actor.shopId, actor.playerId ?? ''];
  const rows = await Fitting.sequelize!.query<{ revision: number }>(sql, { replacements, type: QueryTypes.SELECT });
  if (!rows[0]) throw notFound('That fitting');
  return Number(rows[0].revision);
}

/** JSON with object keys sorted, so equal query inputs make equal keys. */
function canonical(value: unknown): string {
  if (value === null || typeof value !== 'object') return JSON.stringify(value) ?? 'undefined';
  if (Array.isArray(value)) return `[${value.map(canonical).join(',')}]`;
  const record = value as Record<string, unknown>;
  const keys = Object.keys(record).filter((k) => record[k] !== undefined).sort();
  return `{${keys.map((k) => `${JSON.stringify(k)}:${canonical(record[k])}`).join(',')}}`;
}

/**
 * A fitting's analysis answer for an actor and a parsed query: the access check and the
 * revision first (404 for a fitting the actor may not see, cached or not), then the kept
 * answer or `compute()`. O(1) on a hit apart from the one SELECT.
 * @param query every input of the answer (the parsed query string), part of the key
 * @throws HttpError 404, or whatever compute throws (not kept)
 */
export async function cachedFittingAnalysis(
  cache: AnalysisCache,
  actor: Actor,
  fittingId: string,
  query: unknown,
  compute: () => Promise<unknown>,
): Promise<PreparedJson> {
  const revision = await visibleFittingRevision(actor, fittingId);
  const key = `${fittingId}|${revision}|${actor.role}|${actor.units}|${canonical(query)}`;
  return cache.answer(key, fittingId, revision, compute);
}
