import { SectionTabs, type SectionTab } from './section-tabs';
import { useCanEditRegistry } from './use-can-edit-registry';

export const REGISTRY_TABS: readonly SectionTab[] = [
  { href: '/registry/drum-types', label: 'Drum types', testID: 'registry-nav-drum-types' },
  { href: '/registry/dip-tubes', label: 'Dip tubes', testID: 'registry-nav-dip-tubes' },
  { href: '/registry/connectors', label: 'Dispense heads', testID: 'registry-nav-connectors' },
  { href: '/registry/pairings', label: 'Pairings', testID: 'registry-nav-pairings' },
  { href: '/registry/slurries', label: 'Slurries', testID: 'registry-nav-slurries' },
  { href: '/registry/suppliers', label: 'Suppliers', testID: 'registry-nav-suppliers' },
];

const IMPORT_TAB: SectionTab = { href: '/registry/import', label: 'Import', testID: 'registry-nav-import' };

/** Moves between the registry's resources; engineers and admins also see the spec-sheet import. */
export function RegistryNav() {
  const canEdit = useCanEditRegistry();
  return <SectionTabs label="Registry" tabs={canEdit ? [...REGISTRY_TABS, IMPORT_TAB] : REGISTRY_TABS} />;
}
