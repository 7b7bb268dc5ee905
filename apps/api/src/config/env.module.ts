import { Global, Module } from '@nestjs/common';
import { ConfigModule, ConfigService } from '@nestjs/config';
import { ENV, Env, validateEnv } from './env';

/** Validates process.env once (start-up fails listing every bad variable) and provides it typed as ENV. */
@Global()
@Module({
  imports: [ConfigModule.forRoot({ ignoreEnvFile: true, validate: validateEnv, cache: true })],
  providers: [{ provide: ENV, inject: [ConfigService], useFactory: (): Env => validateEnv(process.env) }],
  exports: [ENV],
})
export class EnvModule {}
