import { createColumnHelper } from '@tanstack/react-table';
import { useMemo } from 'react';
import { drumTypeQueries, type DrumTypeRecord } from '../data/drum-types';
import { useLengthUnit } from '../data/me';
import { openingThreads, regionLabel } from './labels';
import { RegistryListScreen } from './registry-list-screen';

const col = createColumnHelper<DrumTypeRecord>();

export function DrumTypeListScreen() {
  const { show } = useLengthUnit();
  const columns = useMemo(
    () => [
      col.accessor('name', { id: 'name', header: 'Name', enableSorting: true, meta: { primary: true, flex: 2.6 } }),
      col.accessor('partNumber', { id: 'partNumber', header: 'Part number', enableSorting: true, meta: { flex: 1.6 } }),
      col.accessor('region', { id: 'region', header: 'Region', enableSorting: true, cell: (c) => regionLabel(c.getValue()), meta: { flex: 1.1 } }),
      col.accessor('nominalCapacityL', { id: 'nominalCapacityL', header: 'Capacity', enableSorting: true, cell: (c) => `${c.getValue()} L`, meta: { align: 'right', flex: 1 } }),
      col.accessor('insideDepthMm', { id: 'insideDepthMm', header: 'Inside depth', enableSorting: true, cell: (c) => show(c.getValue()), meta: { align: 'right', flex: 1.2 } }),
      col.accessor((d) => openingThreads(d.openings), { id: 'openings', header: 'Bung threads', meta: { flex: 1.5 } }),
    ],
    [show],
  );
  return (
    <RegistryListScreen<DrumTypeRecord>
      resource="drum-types"
      title="Drum types"
      subtitle="The drums and containers slurry arrives in: depth, bungs, threads and key collars."
      noun={{ one: 'drum type', many: 'drum types' }}
      searchHint="Name, part number or supplier"
      useList={(p) => drumTypeQueries.useList(p)}
      columns={columns}
      defaultSort={{ key: 'name', order: 'asc' }}
      filters={['region', 'thread', 'key']}
      rowTestID={(d) => d.partNumber}
      showsLengths
      firstHint="with its inside depth and its openings"
    />
  );
}
