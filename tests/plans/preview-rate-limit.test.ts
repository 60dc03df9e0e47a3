/** The per-user token bucket in front of the horizon preview, on a clock the test controls. */
import { describe, expect, it } from 'vitest';
import { TokenBuckets } from '../../server/horizon-preview/preview-rate-limit';

describe('the preview rate limit', () => {
  it('lets a burst through, then refuses with the seconds until the next token, and refills at the set rate', () => {
    const limiter = new TokenBuckets({ burst: 3, perSecond: 2 });
    const t0 = 1_000_000;
    for (let i = 0; i < 3; i++) expect(limiter.take('ana', t0)).toEqual({ ok: true });
    // [D] The bucket is empty; one token takes 1 / 2 s = 0.5 s, reported rounded up to whole seconds.
    expect(limiter.take('ana', t0)).toEqual({ ok: false, retryAfterSeconds: 1 });
    // [D] 0.5 s later one token has come back (2 per second): one request, not two.
    expect(limiter.take('ana', t0 + 500)).toEqual({ ok: true });
    expect(limiter.take('ana', t0 + 500).ok).toBe(false);
    // [D] After a long pause the bucket is full again but never above the burst of 3.
    for (let i = 0; i < 3; i++) expect(limiter.take('ana', t0 + 60_000).ok).toBe(true);
    expect(limiter.take('ana', t0 + 60_000).ok).toBe(false);
  });

  it('counts each user apart, and forgets the longest-idle user past its size (a full bucket needs no memory)', () => {
    const limiter = new TokenBuckets({ burst: 1, perSecond: 0.1, maxKeys: 2 });
    expect(limiter.take('ana', 0).ok).toBe(true);
    expect(limiter.take('ben', 0).ok).toBe(true);
    expect(limiter.take('ana', 1).ok).toBe(false);
    expect(limiter.take('ben', 1).ok).toBe(false);
    // [D] Order of last use: ana (t = 1), ben (t = 1, later). A third user pushes ana out; her return pushes ben out:
    // both start again with a full bucket, whereas tracked they would still be empty (0.1 per second).
    expect(limiter.take('cy', 2).ok).toBe(true);
    expect(limiter.take('ana', 3).ok).toBe(true);
    expect(limiter.take('ben', 3).ok).toBe(true);
  });
});
