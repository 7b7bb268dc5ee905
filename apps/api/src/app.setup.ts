import { INestApplication } from '@nestjs/common';
import { NestExpressApplication } from '@nestjs/platform-express';
import { DocumentBuilder, SwaggerModule } from '@nestjs/swagger';
import { AllExceptionsFilter } from './common/http-exception.filter';
import { requestId } from './common/request-id.middleware';
import { createValidationPipe } from './common/validation';

/** Everything main.ts and the e2e tests share: prefix, request ids, validation, errors, OpenAPI. */
export function configureApp(app: INestApplication): INestApplication {
  const express = app as NestExpressApplication;
  express.set('trust proxy', 'loopback');
  express.disable('x-powered-by');
  // 8 MB: a CSV import of some 30,000 catalogue rows travels as JSON.
  express.useBodyParser('json', { limit: '8mb' });
  app.use(requestId);
  app.setGlobalPrefix('api');
  app.useGlobalPipes(createValidationPipe());
  app.useGlobalFilters(new AllExceptionsFilter());
  app.enableShutdownHooks();
  const doc = SwaggerModule.createDocument(
    app,
    new DocumentBuilder().setTitle('Potlife API').setVersion('0.1').addBearerAuth().build(),
  );
  SwaggerModule.setup('api/docs', app, doc);
  return app;
}
