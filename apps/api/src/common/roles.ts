import { SetMetadata } from '@nestjs/common';

export const ROLES = ['owner', 'estimator', 'storeman'] as const;
export type Role = (typeof ROLES)[number];

export const ROLES_KEY = 'potlife:roles';
export const PUBLIC_KEY = 'potlife:public';

/** The roles allowed on a route. A route with neither @Roles nor @Public is refused (fail closed). */
export const Roles = (...roles: Role[]) => SetMetadata(ROLES_KEY, roles);
/** Anyone may call this route, signed in or not. */
export const Public = () => SetMetadata(PUBLIC_KEY, true);
/** Every signed-in role. */
export const ANY_ROLE: Role[] = [...ROLES];
