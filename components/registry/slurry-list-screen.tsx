import { createColumnHelper } from '@tanstack/react-table';
import { slurryQueries, type SlurryRecord } from '../data/slurries';
import { regionLabel } from './labels';
import { RegistryListScreen } from './registry-list-screen';

const col = createColumnHelper<SlurryRecord>();

const columns = [
  col.accessor('name', { id: 'name', header: 'Name', enableSorting: true, meta: { primary: true, flex: 2 } }),
  col.accessor('supplierName', { id: 'supplierName', header: 'Supplier', meta: { flex: 1.6 } }),
  col.accessor('region', { id: 'region', header: 'Region', enableSorting: true, cell: (c) => regionLabel(c.getValue()), meta: { flex: 1.1 } }),
  col.accessor('drumTypeName', { id: 'drumTypeName', header: 'Arrives in', meta: { flex: 2.2, hideOnPhone: true } }),
  col.accessor('foams', { id: 'foams', header: 'Foams', meta: { flex: 0.7 } }),
  col.accessor('shearSensitive', { id: 'shearSensitive', header: 'Shear-sensitive', meta: { flex: 1 } }),
  col.accessor('solidsWtPct', { id: 'solidsWtPct', header: 'Solids', cell: (c) => `${c.getValue()} wt%`, meta: { align: 'right', flex: 0.8, hideOnPhone: true } }),
];

export function SlurryListScreen() {
  return (
    <RegistryListScreen<SlurryRecord>
      resource="slurries"
      title="Slurries"
      subtitle="Polishing slurries on contract, the drum each arrives in, and how gently it must be handled."
      noun={{ one: 'slurry', many: 'slurries' }}
      searchHint="Name, supplier or drum"
      useList={(p) => slurryQueries.useList(p)}
      columns={columns}
      defaultSort={{ key: 'name', order: 'asc' }}
      filters={['region']}
      rowTestID={(s) => s.name}
      firstHint="with the drum type it arrives in"
    />
  );
}
