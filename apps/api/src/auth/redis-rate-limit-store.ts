import type { ClientRateLimitInfo, Options, Store } from 'express-rate-limit';
import type { Redis } from 'ioredis';

/**
 * A fixed-window express-rate-limit store in Redis, so counters survive restarts and are shared
 * between API processes. Each key expires with its window.
 */
export class RedisRateLimitStore implements Store {
  private windowMs = 60_000;
  readonly localKeys = false;

  constructor(
    private readonly redis: Redis,
    readonly prefix: string,
  ) {}

  init(options: Options): void {
    this.windowMs = options.windowMs;
  }

  private key(key: string): string {
    return `${this.prefix}${key}`;
  }

  async get(key: string): Promise<ClientRateLimitInfo | undefined> {
    const [hits, ttl] = await this.redis.multi().get(this.key(key)).pttl(this.key(key)).exec().then((r) => (r ?? []).map(([, v]) => v));
    if (hits === null || hits === undefined) return undefined;
    return { totalHits: Number(hits), resetTime: new Date(Date.now() + Math.max(Number(ttl), 0)) };
  }

  async increment(key: string): Promise<ClientRateLimitInfo> {
    const results = await this.redis
      .multi()
      .incr(this.key(key))
      .pexpire(this.key(key), this.windowMs, 'NX')
      .pttl(this.key(key))
      .exec();
    const totalHits = Number(results?.[0]?.[1] ?? 1);
    const ttl = Number(results?.[2]?.[1] ?? this.windowMs);
    return { totalHits, resetTime: new Date(Date.now() + (ttl > 0 ? ttl : this.windowMs)) };
  }

  async decrement(key: string): Promise<void> {
    await this.redis.decr(this.key(key));
  }

  async resetKey(key: string): Promise<void> {
    await this.redis.del(this.key(key));
  }
}
