import { CanActivate, ExecutionContext, ForbiddenException, Injectable } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { AuthedRequest } from './current-user';
import { PUBLIC_KEY, Role, ROLES_KEY } from './roles';

const article = (role: string) => (role === 'owner' || role === 'estimator' ? 'an' : 'a');

/** Runs after the JWT guard: the caller's role must be one the route names. */
@Injectable()
export class RolesGuard implements CanActivate {
  constructor(private readonly reflector: Reflector) {}

  canActivate(context: ExecutionContext): boolean {
    const targets = [context.getHandler(), context.getClass()];
    if (this.reflector.getAllAndOverride<boolean>(PUBLIC_KEY, targets)) {
      return true;
    }
    const roles = this.reflector.getAllAndOverride<Role[] | undefined>(ROLES_KEY, targets);
    const user = context.switchToHttp().getRequest<AuthedRequest>().user;
    if (!roles || roles.length === 0) {
      throw new ForbiddenException('This route has no roles assigned; nobody may call it');
    }
    if (!user || !roles.includes(user.role)) {
      const needed = roles.map((r) => `${article(r)} ${r}`).join(' or ');
      throw new ForbiddenException(`This needs ${needed}; you are signed in as ${user ? `${article(user.role)} ${user.role}` : 'nobody'}`);
    }
    return true;
  }
}
