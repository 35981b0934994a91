import { createColumnHelper } from '@tanstack/react-table';
import { pairingQueries, type PairingRecord } from '../data/pairings';
import { formatDate } from './labels';
import { RegistryListScreen } from './registry-list-screen';
import { StatusChip } from './status-chip';

const col = createColumnHelper<PairingRecord>();

const columns = [
  col.accessor('dipTubePartNumber', { id: 'dipTube', header: 'Dip tube', enableSorting: true, meta: { primary: true, flex: 1.7 } }),
  col.accessor('connectorPartNumber', { id: 'connector', header: 'Dispense head', enableSorting: true, meta: { flex: 1.7 } }),
  col.accessor('threadCode', { id: 'threadCode', header: 'Thread', meta: { flex: 0.9 } }),
  col.accessor('status', { id: 'status', header: 'Status', enableSorting: true, cell: (c) => <StatusChip status={c.getValue()} />, meta: { flex: 1.1 } }),
  col.accessor('authorName', { id: 'authorName', header: 'Proposed by', meta: { flex: 1.3, hideOnPhone: true } }),
  col.accessor('approverName', { id: 'approverName', header: 'Reviewed by', meta: { flex: 1.3, hideOnPhone: true } }),
  col.accessor('updatedAt', { id: 'updatedAt', header: 'Last changed', enableSorting: true, cell: (c) => formatDate(c.getValue()), meta: { flex: 1.1 } }),
];

export function PairingListScreen() {
  return (
    <RegistryListScreen<PairingRecord>
      resource="pairings"
      title="Pairings"
      subtitle="Which dip tube goes with which dispense head, as proposed by one engineer and reviewed by another."
      noun={{ one: 'pairing', many: 'pairings' }}
      searchHint="Tube or dispense head part number, notes"
      useList={(p) => pairingQueries.useList(p)}
      columns={columns}
      defaultSort={{ key: 'updatedAt', order: 'desc' }}
      filters={['pairingStatus', 'thread', 'key']}
      rowTestID={(p) => `${p.dipTubePartNumber}+${p.connectorPartNumber}`}
      firstHint="from a dip tube and a dispense head"
    />
  );
}
