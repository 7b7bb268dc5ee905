import { Global, Inject, Injectable, Module, OnApplicationShutdown } from '@nestjs/common';
import Redis from 'ioredis';
import { ENV, Env } from '../config/env';

export const REDIS = Symbol('REDIS');

@Injectable()
class RedisCloser implements OnApplicationShutdown {
  constructor(@Inject(REDIS) private readonly redis: Redis) {}
  async onApplicationShutdown(): Promise<void> {
    await this.redis.quit().catch(() => undefined);
  }
}

/** One shared ioredis connection for plain commands (health, sign-in throttling). */
@Global()
@Module({
  providers: [
    {
      provide: REDIS,
      inject: [ENV],
      useFactory: (env: Env) =>
        new Redis(env.REDIS_URL, { keyPrefix: `${env.REDIS_PREFIX}:`, maxRetriesPerRequest: 2, enableOfflineQueue: true }),
    },
    RedisCloser,
  ],
  exports: [REDIS],
})
export class RedisModule {}
