import type { Role } from '../shared/contract/roles';

export const DEMO_PASSWORD = 'bungwise-demo';

/** The invented site's people: one per role, and a second engineer to review pairings. */
export const DEMO_PEOPLE: Array<{ email: string; name: string; role: Role }> = [
  { email: 'clerk@bungwise.example', name: 'Noor Halvorsen', role: 'clerk' },
  { email: 'engineer@bungwise.example', name: 'Tomasz Ilunga', role: 'engineer' },
  // A second engineer: pairings are approved by an engineer other than their author.
  { email: 'engineer2@bungwise.example', name: 'Mirela Sandoval', role: 'engineer' },
  { email: 'buyer@bungwise.example', name: 'Priya Castellanos', role: 'buyer' },
  { email: 'admin@bungwise.example', name: 'Ewa Okonkwo', role: 'admin' },
];

export const DEMO_SITE_NAME = 'Larkspur Ridge Fab 3';
