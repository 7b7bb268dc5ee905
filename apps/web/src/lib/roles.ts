// The three roles of a Potlife company. Every user has exactly one.
export const ROLES = ['owner', 'estimator', 'storeman'] as const;

export type Role = (typeof ROLES)[number];

export function isRole(value: unknown): value is Role {
  return typeof value === 'string' && (ROLES as readonly string[]).includes(value);
}

export const roleLabels: Record<Role, string> = {
  owner: 'Owner',
  estimator: 'Estimator',
  storeman: 'Storeman',
};

export const roleColors: Record<Role, string> = {
  owner: 'resin',
  estimator: 'teal',
  storeman: 'indigo',
};

/** "an owner", "an estimator", "a storeman": for sentences that name a role. */
export function withArticle(role: Role): string {
  return role === 'storeman' ? `a ${role}` : `an ${role}`;
}

/** "the owner role", "the owner or estimator role". */
export function describeRoles(roles: readonly Role[]): string {
  if (roles.length === 0) {
    return 'a role nobody has';
  }
  const names =
    roles.length === 1 ? roles[0] : `${roles.slice(0, -1).join(', ')} or ${roles[roles.length - 1]}`;
  return `the ${names} role`;
}
