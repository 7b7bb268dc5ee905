import { createParamDecorator, ExecutionContext } from '@nestjs/common';
import type { Request } from 'express';
import type { Role } from './roles';

/** What the bearer token says about the caller; every query is scoped by `companyId`. */
export interface AuthUser {
  id: string;
  companyId: string;
  email: string;
  name: string;
  role: Role;
}

export type AuthedRequest = Request & { user?: AuthUser; requestId?: string };

export const CurrentUser = createParamDecorator((_data: unknown, ctx: ExecutionContext): AuthUser => {
  const req = ctx.switchToHttp().getRequest<AuthedRequest>();
  if (!req.user) {
    throw new Error('CurrentUser used on a public route');
  }
  return req.user;
});
