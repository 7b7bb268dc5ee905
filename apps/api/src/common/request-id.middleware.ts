import { randomUUID } from 'node:crypto';
import type { NextFunction, Response } from 'express';
import { AuthedRequest } from './current-user';

/** Gives every request an id (kept from `X-Request-Id` when a proxy sent a sane one) and echoes it. */
export function requestId(req: AuthedRequest, res: Response, next: NextFunction): void {
  const incoming = req.header('x-request-id');
  req.requestId = incoming && /^[\w-]{8,64}$/.test(incoming) ? incoming : randomUUID();
  res.setHeader('X-Request-Id', req.requestId);
  next();
}
