import { SectionTabs, type SectionTab } from './section-tabs';

export const REGISTRY_TABS: readonly SectionTab[] = [
  { href: '/registry/drum-types', label: 'Drum types', testID: 'registry-nav-drum-types' },
  { href: '/registry/dip-tubes', label: 'Dip tubes', testID: 'registry-nav-dip-tubes' },
  { href: '/registry/connectors', label: 'Connectors', testID: 'registry-nav-connectors' },
  { href: '/registry/pairings', label: 'Pairings', testID: 'registry-nav-pairings' },
  { href: '/registry/slurries', label: 'Slurries', testID: 'registry-nav-slurries' },
  { href: '/registry/suppliers', label: 'Suppliers', testID: 'registry-nav-suppliers' },
];

/** Moves between the registry's resources. */
export function RegistryNav() {
  return <SectionTabs label="Registry" tabs={REGISTRY_TABS} />;
}
