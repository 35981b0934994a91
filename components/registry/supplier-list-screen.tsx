import { createColumnHelper } from '@tanstack/react-table';
import { supplierQueries, type SupplierRecord } from '../data/suppliers';
import { formatDate, regionLabel } from './labels';
import { RegistryListScreen } from './registry-list-screen';

const col = createColumnHelper<SupplierRecord>();

const columns = [
  col.accessor('name', { id: 'name', header: 'Name', enableSorting: true, meta: { primary: true, flex: 1.8 } }),
  col.accessor('region', { id: 'region', header: 'Region', enableSorting: true, cell: (c) => regionLabel(c.getValue()), meta: { flex: 1 } }),
  col.accessor('contactEmail', { id: 'contactEmail', header: 'Contact', meta: { flex: 1.8 } }),
  col.accessor('notes', { id: 'notes', header: 'Notes', meta: { flex: 3, hideOnPhone: true } }),
  col.accessor('updatedAt', { id: 'updatedAt', header: 'Last changed', enableSorting: true, cell: (c) => formatDate(c.getValue()), meta: { flex: 1, hideOnPhone: true } }),
];

export function SupplierListScreen() {
  return (
    <RegistryListScreen<SupplierRecord>
      resource="suppliers"
      title="Suppliers"
      subtitle="Who ships the slurry, the drums and the hardware, and from which region."
      noun={{ one: 'supplier', many: 'suppliers' }}
      searchHint="Name or e-mail"
      useList={(p) => supplierQueries.useList(p)}
      columns={columns}
      defaultSort={{ key: 'name', order: 'asc' }}
      filters={['region']}
      rowTestID={(s) => s.name}
      firstHint="with its region and contact"
    />
  );
}
