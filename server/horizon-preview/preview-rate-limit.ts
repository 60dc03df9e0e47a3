/**
 * A per-user token bucket for the horizon preview: the process has one preview
 * thread for everyone, so one user's slider must not crowd out everyone
 * else. Kept in memory (the preview writes nothing, not even a counter): each
 * process limits its own share, which is enough to keep any one of them responsive.
 */
export interface RateLimitOptions {
  /** Requests allowed at once after a quiet spell. */
  readonly burst: number;
  /** Requests per second sustained. */
  readonly perSecond: number;
  /** Users tracked at most; the longest-idle are forgotten first (a full bucket needs no memory). */
  readonly maxKeys?: number;
}

export type Taken = { ok: true } | { ok: false; retryAfterSeconds: number };

export class TokenBuckets {
  private readonly buckets = new Map<string, { tokens: number; atMs: number }>();

  constructor(private readonly options: RateLimitOptions) {}

  take(key: string, nowMs: number = Date.now()): Taken {
    const { burst, perSecond, maxKeys = 10_000 } = this.options;
    const bucket = this.buckets.get(key);
    const tokens = bucket ? Math.min(burst, bucket.tokens + ((nowMs - bucket.atMs) / 1000) * perSecond) : burst;
    // Re-insert so the Map's order is least recently used first.
    this.buckets.delete(key);
    if (tokens < 1) {
      this.buckets.set(key, { tokens, atMs: nowMs });
      return { ok: false, retryAfterSeconds: Math.max(1, Math.ceil((1 - tokens) / perSecond)) };
    }
    this.buckets.set(key, { tokens: tokens - 1, atMs: nowMs });
    if (this.buckets.size > maxKeys) {
      const oldest = this.buckets.keys().next().value;
      if (oldest !== undefined) this.buckets.delete(oldest);
    }
    return { ok: true };
  }
}
