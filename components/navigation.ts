import { ROLES, rolesFor, type Role } from '@/shared/contract/roles';

export interface NavItem {
  href: string;
  label: string;
  /** Roles that see the item; the server enforces the same rules on every request. */
  roles: readonly Role[];
  testID: string;
  /** Shown in the phone's bottom bar; the rest sit behind "More". */
  primary?: boolean;
}

const everyone = ROLES;

export const NAV_ITEMS: NavItem[] = [
  { href: '/', label: 'Home', roles: everyone, testID: 'nav-home', primary: true },
  { href: '/receive', label: 'Dock check', roles: rolesFor('check-lots'), testID: 'nav-receive', primary: true },
  { href: '/registry/drum-types', label: 'Registry', roles: everyone, testID: 'nav-registry', primary: true },
  { href: '/sourcing', label: 'Sourcing', roles: rolesFor('plan-sourcing'), testID: 'nav-sourcing', primary: true },
  { href: '/stations', label: 'Stations', roles: everyone, testID: 'nav-stations', primary: true },
  { href: '/tools/thread', label: 'Tools', roles: everyone, testID: 'nav-tools' },
  { href: '/admin/users', label: 'People', roles: rolesFor('manage-people'), testID: 'nav-users' },
];

export const navFor = (role: Role) => NAV_ITEMS.filter((i) => i.roles.includes(role));

export function isActive(href: string, pathname: string): boolean {
  if (href === '/') return pathname === '/';
  // Sections: /registry/… and /tools/… are one item each.
  const section = href.split('/').slice(0, 2).join('/');
  return pathname === href || pathname.startsWith(`${section}/`) || pathname === section;
}
