import { BadRequestException, createParamDecorator, ExecutionContext } from '@nestjs/common';
import type { Request } from 'express';

/**
 * The `Idempotency-Key` header (1–200 visible ASCII characters, e.g. a UUID the form made when
 * it opened), or undefined. A bad one answers 400 naming the header.
 */
export const IdempotencyKey = createParamDecorator((_data: unknown, ctx: ExecutionContext): string | undefined => {
  const raw = ctx.switchToHttp().getRequest<Request>().header('idempotency-key');
  if (raw === undefined || raw === '') {
    return undefined;
  }
  if (!/^[\x21-\x7e]{1,200}$/.test(raw)) {
    throw new BadRequestException({ message: 'Idempotency-Key: must be 1–200 visible ASCII characters, such as a UUID', code: 'validation_failed' });
  }
  return raw;
});
