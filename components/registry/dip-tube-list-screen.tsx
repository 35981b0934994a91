import { createColumnHelper } from '@tanstack/react-table';
import { useMemo } from 'react';
import { dipTubeQueries, type DipTubeRecord } from '../data/dip-tubes';
import { useLengthUnit } from '../data/me';
import { CHANNEL_LABELS } from './labels';
import { RegistryListScreen } from './registry-list-screen';

const col = createColumnHelper<DipTubeRecord>();

export function DipTubeListScreen() {
  const { show } = useLengthUnit();
  const columns = useMemo(
    () => [
      col.accessor('partNumber', { id: 'partNumber', header: 'Part number', enableSorting: true, meta: { primary: true, flex: 1.8 } }),
      col.accessor('threadCode', { id: 'thread', header: 'Thread', enableSorting: true, meta: { flex: 1 } }),
      col.accessor('lengthMm', { id: 'lengthMm', header: 'Length', enableSorting: true, cell: (c) => show(c.getValue()), meta: { align: 'right', flex: 1 } }),
      col.accessor('boreMm', { id: 'boreMm', header: 'Bore', cell: (c) => show(c.getValue()), meta: { align: 'right', flex: 0.9, hideOnPhone: true } }),
      col.accessor('keyCode', { id: 'keyCode', header: 'Key', meta: { flex: 1.1 } }),
      col.accessor('channels', { id: 'channels', header: 'Channels', cell: (c) => CHANNEL_LABELS[c.getValue()], meta: { flex: 1.3 } }),
      col.accessor('material', { id: 'material', header: 'Material', meta: { flex: 0.9, hideOnPhone: true } }),
      col.accessor('supplierName', { id: 'supplierName', header: 'Supplier', meta: { flex: 1.6, hideOnPhone: true } }),
    ],
    [show],
  );
  return (
    <RegistryListScreen<DipTubeRecord>
      resource="dip-tubes"
      title="Dip tubes"
      subtitle="Tubes that thread into a bung and draw slurry from near the drum bottom."
      noun={{ one: 'dip tube', many: 'dip tubes' }}
      searchHint="Part number or material"
      useList={(p) => dipTubeQueries.useList(p)}
      columns={columns}
      defaultSort={{ key: 'partNumber', order: 'asc' }}
      filters={['thread', 'key']}
      rowTestID={(t) => t.partNumber}
      showsLengths
      firstHint="with its thread, length and bore"
    />
  );
}
