import type { SupplierRecord } from '@/shared/contract/records';
import { registryDetail, FactList, RelationList, Section } from './detail-parts';
import { regionLabel } from './labels';

/** The supplier detail answer carries counts of what is registered from it. */
type SupplierDetail = SupplierRecord & { drumTypes?: number; dipTubes?: number; connectors?: number };

const count = (n: number | undefined, one: string, many: string) => (n === undefined ? undefined : `${n} ${n === 1 ? one : many} registered`);

export const SupplierDetailScreen = registryDetail('suppliers', {
  title: (s) => s.name,
  subtitle: (s) => regionLabel(s.region),
  columns: (supplier) => {
    const s: SupplierDetail = supplier;
    const narrow = (path: string) => `/registry/${path}?supplierId=${s.id}`;
    return [
      <Section title="Supplier" testID="supplier-facts">
        <FactList
          facts={[
            { label: 'Region', value: regionLabel(s.region) },
            { label: 'Contact', value: s.contactEmail ?? 'none recorded' },
            { label: 'Notes', value: s.notes || '—' },
          ]}
        />
      </Section>,
      <Section title="From this supplier" testID="supplier-relations">
        <RelationList
          empty=""
          items={[
            { key: 'drum-types', title: 'Drum types', href: narrow('drum-types'), detail: count(s.drumTypes, 'drum type', 'drum types'), testID: 'supplier-drum-types' },
            { key: 'dip-tubes', title: 'Dip tubes', href: narrow('dip-tubes'), detail: count(s.dipTubes, 'dip tube', 'dip tubes'), testID: 'supplier-dip-tubes' },
            { key: 'connectors', title: 'Dispense heads', href: narrow('connectors'), detail: count(s.connectors, 'dispense head', 'dispense heads'), testID: 'supplier-connectors' },
            { key: 'slurries', title: 'Slurries', href: narrow('slurries'), testID: 'supplier-slurries' },
          ]}
        />
      </Section>,
    ];
  },
});
