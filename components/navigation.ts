import type { Role } from '@/shared/roles';

export interface NavItem {
  href: string;
  label: string;
  /** Roles that see the item; the server enforces the same rules on every request. */
  roles: readonly Role[];
  testID: string;
}

const everyone = ['clerk', 'engineer', 'buyer', 'admin'] as const;

export const NAV_ITEMS: NavItem[] = [
  { href: '/', label: 'Home', roles: everyone, testID: 'nav-home' },
  { href: '/admin/users', label: 'People', roles: ['admin'], testID: 'nav-users' },
];

export const navFor = (role: Role) => NAV_ITEMS.filter((i) => i.roles.includes(role));

export function isActive(href: string, pathname: string): boolean {
  return href === '/' ? pathname === '/' : pathname === href || pathname.startsWith(`${href}/`);
}
