import 'reflect-metadata';
import { Logger } from '@nestjs/common';
import { NestFactory } from '@nestjs/core';

/**
 * A queue worker as its own process (for running at scale): the same modules without HTTP.
 * Start API processes with QUEUE_ROLE=api and one or more of these with QUEUE_ROLE=worker.
 */
async function bootstrap(): Promise<void> {
  process.env.QUEUE_ROLE = process.env.QUEUE_ROLE ?? 'worker';
  const { AppModule } = await import('./app.module');
  const app = await NestFactory.createApplicationContext(AppModule);
  app.enableShutdownHooks();
  Logger.log('Potlife queue worker running', 'Potlife');
}

bootstrap().catch((err: unknown) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
