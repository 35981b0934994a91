/** The four roles of Bungwise and what each may do; client and server read the same table. */
export const ROLES = ['clerk', 'engineer', 'buyer', 'admin'] as const;
export type Role = (typeof ROLES)[number];

export const ROLE_LABELS: Record<Role, string> = {
  clerk: 'Receiving clerk',
  engineer: 'Engineer',
  buyer: 'Buyer',
  admin: 'Administrator',
};

export function isRole(value: unknown): value is Role {
  return typeof value === 'string' && (ROLES as readonly string[]).includes(value);
}
