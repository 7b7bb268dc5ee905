import { HttpException, HttpStatus, Inject, Injectable } from '@nestjs/common';
import type Redis from 'ioredis';
import { ENV, Env } from '../config/env';
import { REDIS } from '../redis/redis.module';

/**
 * Counts failed sign-ins per e-mail address and per address+IP in Redis, so every API process
 * sees the same count. Past the limit, sign-in answers 429 until the window ends.
 */
@Injectable()
export class LoginThrottleService {
  constructor(
    @Inject(REDIS) private readonly redis: Redis,
    @Inject(ENV) private readonly env: Env,
  ) {}

  private key(email: string, ip: string): string {
    return `login-failures:${email.toLowerCase()}:${ip}`;
  }

  async assertAllowed(email: string, ip: string): Promise<void> {
    const key = this.key(email, ip);
    const failures = Number((await this.redis.get(key)) ?? 0);
    if (failures >= this.env.LOGIN_MAX_FAILURES) {
      const ttl = await this.redis.ttl(key);
      const minutes = Math.max(1, Math.ceil(ttl / 60));
      throw new HttpException(
        {
          message: `Too many failed sign-ins for this address; try again in ${minutes} minute${minutes === 1 ? '' : 's'}, or ask your owner to reset your access`,
          code: 'too_many_requests',
        },
        HttpStatus.TOO_MANY_REQUESTS,
      );
    }
  }

  async recordFailure(email: string, ip: string): Promise<void> {
    const key = this.key(email, ip);
    const n = await this.redis.incr(key);
    if (n === 1) {
      await this.redis.expire(key, this.env.LOGIN_FAILURE_WINDOW_S);
    }
  }

  async clear(email: string, ip: string): Promise<void> {
    await this.redis.del(this.key(email, ip));
  }
}
