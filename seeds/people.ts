import type { Role } from '../shared/roles';

export const DEMO_PASSWORD = 'bungwise-demo';

/** The invented site's four people, one per role. */
export const DEMO_PEOPLE: Array<{ email: string; name: string; role: Role }> = [
  { email: 'clerk@bungwise.example', name: 'Noor Halvorsen', role: 'clerk' },
  { email: 'engineer@bungwise.example', name: 'Tomasz Ilunga', role: 'engineer' },
  { email: 'buyer@bungwise.example', name: 'Priya Castellanos', role: 'buyer' },
  { email: 'admin@bungwise.example', name: 'Ewa Okonkwo', role: 'admin' },
];

export const DEMO_SITE_NAME = 'Larkspur Ridge Fab 3';
