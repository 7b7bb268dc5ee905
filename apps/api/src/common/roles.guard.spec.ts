import { ExecutionContext, ForbiddenException } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { RolesGuard } from './roles.guard';
import { PUBLIC_KEY, ROLES_KEY } from './roles';

const ctx = (user?: { role: string }) =>
  ({
    getHandler: () => undefined,
    getClass: () => undefined,
    switchToHttp: () => ({ getRequest: () => ({ user }) }),
  }) as unknown as ExecutionContext;

const reflectorWith = (meta: Record<string, unknown>) =>
  ({ getAllAndOverride: (key: string) => meta[key] }) as unknown as Reflector;

describe('RolesGuard', () => {
  it('lets public routes through', () => {
    expect(new RolesGuard(reflectorWith({ [PUBLIC_KEY]: true })).canActivate(ctx())).toBe(true);
  });

  it('fails closed on a route with no roles', () => {
    expect(() => new RolesGuard(reflectorWith({})).canActivate(ctx({ role: 'owner' }))).toThrow(ForbiddenException);
  });

  it('allows a listed role and names the needed role otherwise', () => {
    const guard = new RolesGuard(reflectorWith({ [ROLES_KEY]: ['owner', 'estimator'] }));
    expect(guard.canActivate(ctx({ role: 'estimator' }))).toBe(true);
    expect(() => guard.canActivate(ctx({ role: 'storeman' }))).toThrow('This needs an owner or an estimator; you are signed in as a storeman');
  });
});
