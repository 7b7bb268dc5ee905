import { Controller, Get, Inject, Res } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { InjectDataSource } from '@nestjs/typeorm';
import type { Response } from 'express';
import type Redis from 'ioredis';
import { DataSource } from 'typeorm';
import { Public } from '../common/roles';
import { REDIS } from '../redis/redis.module';

const within = <T>(p: Promise<T>, ms: number) =>
  Promise.race([p, new Promise<never>((_, reject) => setTimeout(() => reject(new Error('timeout')), ms).unref())]);

@ApiTags('health')
@Controller('health')
export class HealthController {
  constructor(
    @InjectDataSource() private readonly db: DataSource,
    @Inject(REDIS) private readonly redis: Redis,
  ) {}

  @Public()
  @Get()
  async health(@Res({ passthrough: true }) res: Response) {
    const database = await within(this.db.query('SELECT 1'), 2000).then(() => 'up' as const, () => 'down' as const);
    const redis = await within(this.redis.ping(), 2000).then(() => 'up' as const, () => 'down' as const);
    const ok = database === 'up' && redis === 'up';
    res.status(ok ? 200 : 503);
    return { status: ok ? 'ok' : 'degraded', database, redis };
  }
}
