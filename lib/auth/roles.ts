/** The five roles of a Nodewright team. */
export const ROLES = ['analyst', 'reviewer', 'config-manager', 'customer', 'admin'] as const;
export type Role = (typeof ROLES)[number];

export const ROLE_LABELS: Record<Role, string> = {
  analyst: 'Analyst',
  reviewer: 'Reviewer',
  'config-manager': 'Configuration manager',
  customer: 'Customer',
  admin: 'Administrator',
};

export function isRole(value: unknown): value is Role {
  return typeof value === 'string' && (ROLES as readonly string[]).includes(value);
}
