import { createColumnHelper } from '@tanstack/react-table';
import { useMemo } from 'react';
import { connectorQueries, type ConnectorRecord } from '../data/connectors';
import { useLengthUnit } from '../data/me';
import { RETURN_PATH_LABELS, SUITED_TO_LABELS } from './labels';
import { RegistryListScreen } from './registry-list-screen';

const col = createColumnHelper<ConnectorRecord>();

export function ConnectorListScreen() {
  const { show } = useLengthUnit();
  const columns = useMemo(
    () => [
      col.accessor('partNumber', { id: 'partNumber', header: 'Part number', enableSorting: true, meta: { primary: true, flex: 1.8 } }),
      col.accessor('feedBoreMm', { id: 'feedBoreMm', header: 'Feed port', enableSorting: true, cell: (c) => `${c.row.original.feedNominal} (${show(c.getValue(), 2)})`, meta: { flex: 1.5 } }),
      col.accessor('returnBoreMm', {
        id: 'returnBoreMm',
        header: 'Return port',
        cell: (c) => (c.getValue() == null ? 'none' : `${c.row.original.returnNominal ?? ''} (${show(c.getValue(), 2)})`.trim()),
        meta: { flex: 1.5 },
      }),
      col.accessor('returnPath', { id: 'returnPath', header: 'Return path', cell: (c) => RETURN_PATH_LABELS[c.getValue()], meta: { flex: 1.4, hideOnPhone: true } }),
      col.accessor('suitedTo', { id: 'suitedTo', header: 'Suited to', enableSorting: true, cell: (c) => SUITED_TO_LABELS[c.getValue()], meta: { flex: 1.4 } }),
      col.accessor('keyCode', { id: 'keyCode', header: 'Key', meta: { flex: 1.1 } }),
      col.accessor('supplierName', { id: 'supplierName', header: 'Supplier', meta: { flex: 1.5, hideOnPhone: true } }),
    ],
    [show],
  );
  return (
    <RegistryListScreen<ConnectorRecord>
      resource="connectors"
      title="Dispense heads"
      subtitle="Heads that lock onto a dip tube: feed and return ports, keying and tapping."
      noun={{ one: 'dispense head', many: 'dispense heads' }}
      searchHint="Part number or wetted material"
      useList={(p) => connectorQueries.useList(p)}
      columns={columns}
      defaultSort={{ key: 'partNumber', order: 'asc' }}
      filters={['key', 'suitedTo']}
      rowTestID={(c) => c.partNumber}
      showsLengths
      firstHint="with its feed and return bores"
    />
  );
}
