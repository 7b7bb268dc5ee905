import { BullModule } from '@nestjs/bull';
import { DynamicModule, Module } from '@nestjs/common';
import { APP_GUARD } from '@nestjs/core';
import { ServeStaticModule } from '@nestjs/serve-static';
import { ThrottlerGuard, ThrottlerModule } from '@nestjs/throttler';
import { TypeOrmModule } from '@nestjs/typeorm';
import { existsSync } from 'node:fs';
import path from 'node:path';
import { AuthModule } from './auth/auth.module';
import { JwtAuthGuard } from './common/jwt-auth.guard';
import { RolesGuard } from './common/roles.guard';
import { CompaniesModule } from './companies/companies.module';
import { ENV, Env } from './config/env';
import { EnvModule } from './config/env.module';
import { dataSourceOptions } from './database/data-source';
import { HealthController } from './health/health.controller';
import { MailModule } from './mail/mail.module';
import { RedisModule } from './redis/redis.module';
import { UsersModule } from './users/users.module';
import { CatalogueModule } from './catalogue/catalogue.module';
import { SuppliersModule } from './suppliers/suppliers.module';
import { StockModule } from './stock/stock.module';
import { JobsModule } from './jobs/jobs.module';

/** The built web app, served at `/` when it exists (production mode); `/api` stays the API's. */
function webApp(): DynamicModule[] {
  const dist = path.resolve(process.env.WEB_DIST_DIR || path.join(__dirname, '../../web/dist'));
  return existsSync(path.join(dist, 'index.html'))
    ? [ServeStaticModule.forRoot({ rootPath: dist, exclude: ['/api/{*path}'], serveStaticOptions: { maxAge: '1h', index: false } })]
    : [];
}

@Module({
  imports: [
    EnvModule,
    TypeOrmModule.forRootAsync({
      inject: [ENV],
      useFactory: (env: Env) => ({ ...dataSourceOptions(env.DATABASE_URL), autoLoadEntities: true }),
    }),
    BullModule.forRootAsync({
      inject: [ENV],
      useFactory: (env: Env) => ({
        url: env.REDIS_URL,
        prefix: `${env.REDIS_PREFIX}:bull`,
        settings: {
          backoffStrategies: {
            // Exponential from MAIL_RETRY_BASE_MS, capped at a minute: a long outage keeps retrying steadily.
            capped: (attemptsMade: number) => Math.min(env.MAIL_RETRY_BASE_MS * 2 ** Math.max(0, attemptsMade - 1), 60_000),
          },
        },
      }),
    }),
    ThrottlerModule.forRootAsync({
      inject: [ENV],
      useFactory: (env: Env) => [{ ttl: 60_000, limit: env.RATE_LIMIT_PER_MINUTE }],
    }),
    RedisModule,
    CompaniesModule,
    AuthModule,
    UsersModule,
    MailModule,
    CatalogueModule,
    SuppliersModule,
    StockModule,
    JobsModule,
    ...webApp(),
  ],
  controllers: [HealthController],
  providers: [
    { provide: APP_GUARD, useClass: ThrottlerGuard },
    { provide: APP_GUARD, useClass: JwtAuthGuard },
    { provide: APP_GUARD, useClass: RolesGuard },
  ],
})
export class AppModule {}
