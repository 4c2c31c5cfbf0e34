import { AnalysisCache } from '@/server/services/analysis-cache';

/** A computation that counts its calls and answers a body of about `bytes` bytes. */
function counted(bytes = 100) {
  const fn = Object.assign(
    async () => {
      fn.calls += 1;
      return { text: 'x'.repeat(bytes), call: fn.calls };
    },
    { calls: 0 },
  );
  return fn;
}

describe('AnalysisCache', () => {
  it('answer for a key asked twice computes once and gives the same bytes', async () => {
    const cache = new AnalysisCache(1_000_000);
    const compute = counted();
    const a = await cache.answer('f1|1|q', 'f1', 1, compute);
    const b = await cache.answer('f1|1|q', 'f1', 1, compute);
    expect(compute.calls).toBe(1);
    expect(b.body.equals(a.body)).toBe(true);
    expect(b.etag).toBe(a.etag);
  });

  it('answer asked by many requests at once shares one computation', async () => {
    const cache = new AnalysisCache(1_000_000);
    const compute = counted();
    const answers = await Promise.all(Array.from({ length: 20 }, () => cache.answer('f1|1|q', 'f1', 1, compute)));
    expect(compute.calls).toBe(1);
    expect(new Set(answers.map((a) => a.etag)).size).toBe(1);
  });

  it('answer for a newer revision drops the older ones of that fitting only', async () => {
    const cache = new AnalysisCache(1_000_000);
    const compute = counted();
    await cache.answer('f1|1|q', 'f1', 1, compute);
    await cache.answer('f2|1|q', 'f2', 1, compute);
    await cache.answer('f1|2|q', 'f1', 2, compute);
    expect(cache.size).toBe(2);
    await cache.answer('f2|1|q', 'f2', 1, compute);
    expect(compute.calls).toBe(3);
  });

  it('answer computed for a revision older than one already seen is served but not kept', async () => {
    const cache = new AnalysisCache(1_000_000);
    const compute = counted();
    await cache.answer('f1|5|q', 'f1', 5, compute);
    const old = await cache.answer('f1|4|q', 'f1', 4, compute);
    expect(JSON.parse(old.body.toString()).call).toBe(2);
    await cache.answer('f1|4|q', 'f1', 4, compute);
    expect(compute.calls).toBe(3);
  });

  it('answer whose computation fails is not kept: the next request computes again', async () => {
    const cache = new AnalysisCache(1_000_000);
    let calls = 0;
    const failing = async () => {
      calls += 1;
      throw new RangeError('no such build');
    };
    await expect(cache.answer('k', 'f1', 1, failing)).rejects.toThrow('no such build');
    await expect(cache.answer('k', 'f1', 1, failing)).rejects.toThrow('no such build');
    expect(calls).toBe(2);
    expect(cache.size).toBe(0);
  });

  it('answers beyond the byte budget push out the least recently used first', async () => {
    // Each body is about 1,000 bytes; the budget holds three.
    const cache = new AnalysisCache(3_500);
    const compute = counted(1000);
    await cache.answer('a', 'fa', 1, compute);
    await cache.answer('b', 'fb', 1, compute);
    await cache.answer('c', 'fc', 1, compute);
    await cache.answer('a', 'fa', 1, compute); // a is now the most recent
    await cache.answer('d', 'fd', 1, compute); // b goes
    expect(cache.size).toBe(3);
    expect(cache.heldBytes).toBeLessThanOrEqual(3_500);
    const before = compute.calls;
    await cache.answer('a', 'fa', 1, compute);
    await cache.answer('c', 'fc', 1, compute);
    await cache.answer('d', 'fd', 1, compute);
    expect(compute.calls).toBe(before);
    await cache.answer('b', 'fb', 1, compute);
    expect(compute.calls).toBe(before + 1);
  });

  it('answer larger than half the budget is served and not kept', async () => {
    const cache = new AnalysisCache(1_000);
    const compute = counted(800);
    const a = await cache.answer('big', 'f1', 1, compute);
    expect(a.body.length).toBeGreaterThan(800);
    expect(cache.size).toBe(0);
    expect(cache.heldBytes).toBe(0);
  });

  it('answer with a zero budget keeps nothing', async () => {
    const cache = new AnalysisCache(0);
    const compute = counted(10);
    await cache.answer('k', 'f1', 1, compute);
    await cache.answer('k', 'f1', 1, compute);
    expect(compute.calls).toBe(2);
  });
});
