// The registry's list screens, one chunk: with the table library (@tanstack/react-table) they are loaded
// through `lazy-lists.tsx` only, so none of it weighs on the first load of another screen (the dock).
// Each list is its configuration; `registryList` builds the screen (search, filters, table, states).
import { CHANNEL_LABELS, formatDate, openingThreads, regionLabel, RETURN_PATH_LABELS, SUITED_TO_LABELS } from './labels';
import { registryList } from './registry-list-screen';
import { StatusChip } from './status-chip';

export const DrumTypeListScreen = registryList('drum-types', {
  title: 'Drum types',
  subtitle: 'The drums and containers slurry arrives in: depth, bungs, threads and key collars.',
  searchHint: 'Name, part number or supplier',
  columns: (col, show) => [
    col.accessor('name', { id: 'name', header: 'Name', enableSorting: true, meta: { primary: true, flex: 2.6 } }),
    col.accessor('partNumber', { id: 'partNumber', header: 'Part number', enableSorting: true, meta: { flex: 1.6 } }),
    col.accessor('region', { id: 'region', header: 'Region', enableSorting: true, cell: (c) => regionLabel(c.getValue()), meta: { flex: 1.1 } }),
    col.accessor('nominalCapacityL', { id: 'nominalCapacityL', header: 'Capacity', enableSorting: true, cell: (c) => `${c.getValue()} L`, meta: { align: 'right', flex: 1 } }),
    col.accessor('insideDepthMm', { id: 'insideDepthMm', header: 'Inside depth', enableSorting: true, cell: (c) => show(c.getValue()), meta: { align: 'right', flex: 1.2 } }),
    col.accessor((d) => openingThreads(d.openings), { id: 'openings', header: 'Bung threads', meta: { flex: 1.5 } }),
  ],
  defaultSort: { key: 'name', order: 'asc' },
  filters: ['region', 'thread', 'key'],
  rowTestID: (d) => d.partNumber,
  firstHint: 'with its inside depth and its openings',
});

export const DipTubeListScreen = registryList('dip-tubes', {
  title: 'Dip tubes',
  subtitle: 'Tubes that thread into a bung and draw slurry from near the drum bottom.',
  searchHint: 'Part number or material',
  columns: (col, show) => [
    col.accessor('partNumber', { id: 'partNumber', header: 'Part number', enableSorting: true, meta: { primary: true, flex: 1.8 } }),
    col.accessor('threadCode', { id: 'thread', header: 'Thread', enableSorting: true, meta: { flex: 1 } }),
    col.accessor('lengthMm', { id: 'lengthMm', header: 'Length', enableSorting: true, cell: (c) => show(c.getValue()), meta: { align: 'right', flex: 1 } }),
    col.accessor('boreMm', { id: 'boreMm', header: 'Bore', cell: (c) => show(c.getValue()), meta: { align: 'right', flex: 0.9, hideOnPhone: true } }),
    col.accessor('keyCode', { id: 'keyCode', header: 'Key', meta: { flex: 1.1 } }),
    col.accessor('channels', { id: 'channels', header: 'Channels', cell: (c) => CHANNEL_LABELS[c.getValue()], meta: { flex: 1.3 } }),
    col.accessor('material', { id: 'material', header: 'Material', meta: { flex: 0.9, hideOnPhone: true } }),
    col.accessor('supplierName', { id: 'supplierName', header: 'Supplier', meta: { flex: 1.6, hideOnPhone: true } }),
  ],
  defaultSort: { key: 'partNumber', order: 'asc' },
  filters: ['thread', 'key'],
  rowTestID: (t) => t.partNumber,
  firstHint: 'with its thread, length and bore',
});

export const ConnectorListScreen = registryList('connectors', {
  title: 'Dispense heads',
  subtitle: 'Heads that lock onto a dip tube: feed and return ports, keying and tapping.',
  searchHint: 'Part number or wetted material',
  columns: (col, show) => [
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
  defaultSort: { key: 'partNumber', order: 'asc' },
  filters: ['key', 'suitedTo'],
  rowTestID: (c) => c.partNumber,
  firstHint: 'with its feed and return bores',
});

export const PairingListScreen = registryList('pairings', {
  title: 'Pairings',
  subtitle: 'Which dip tube goes with which dispense head, as proposed by one engineer and reviewed by another.',
  searchHint: 'Tube or dispense head part number, notes',
  columns: (col) => [
    col.accessor('dipTubePartNumber', { id: 'dipTube', header: 'Dip tube', enableSorting: true, meta: { primary: true, flex: 1.7 } }),
    col.accessor('connectorPartNumber', { id: 'connector', header: 'Dispense head', enableSorting: true, meta: { flex: 1.7 } }),
    col.accessor('threadCode', { id: 'threadCode', header: 'Thread', meta: { flex: 0.9 } }),
    col.accessor('status', { id: 'status', header: 'Status', enableSorting: true, cell: (c) => <StatusChip status={c.getValue()} />, meta: { flex: 1.1 } }),
    col.accessor('authorName', { id: 'authorName', header: 'Proposed by', meta: { flex: 1.3, hideOnPhone: true } }),
    col.accessor('approverName', { id: 'approverName', header: 'Reviewed by', meta: { flex: 1.3, hideOnPhone: true } }),
    col.accessor('updatedAt', { id: 'updatedAt', header: 'Last changed', enableSorting: true, cell: (c) => formatDate(c.getValue()), meta: { flex: 1.1 } }),
  ],
  defaultSort: { key: 'updatedAt', order: 'desc' },
  filters: ['pairingStatus', 'thread', 'key'],
  rowTestID: (p) => `${p.dipTubePartNumber}+${p.connectorPartNumber}`,
  firstHint: 'from a dip tube and a dispense head',
});

export const SlurryListScreen = registryList('slurries', {
  title: 'Slurries',
  subtitle: 'Polishing slurries on contract, the drum each arrives in, and how gently it must be handled.',
  searchHint: 'Name, supplier or drum',
  columns: (col) => [
    col.accessor('name', { id: 'name', header: 'Name', enableSorting: true, meta: { primary: true, flex: 2 } }),
    col.accessor('supplierName', { id: 'supplierName', header: 'Supplier', meta: { flex: 1.6 } }),
    col.accessor('region', { id: 'region', header: 'Region', enableSorting: true, cell: (c) => regionLabel(c.getValue()), meta: { flex: 1.1 } }),
    col.accessor('drumTypeName', { id: 'drumTypeName', header: 'Arrives in', meta: { flex: 2.2, hideOnPhone: true } }),
    col.accessor('foams', { id: 'foams', header: 'Foams', meta: { flex: 0.7 } }),
    col.accessor('shearSensitive', { id: 'shearSensitive', header: 'Shear-sensitive', meta: { flex: 1 } }),
    col.accessor('solidsWtPct', { id: 'solidsWtPct', header: 'Solids', cell: (c) => `${c.getValue()} wt%`, meta: { align: 'right', flex: 0.8, hideOnPhone: true } }),
  ],
  defaultSort: { key: 'name', order: 'asc' },
  filters: ['region'],
  rowTestID: (s) => s.name,
  firstHint: 'with the drum type it arrives in',
});

export const SupplierListScreen = registryList('suppliers', {
  title: 'Suppliers',
  subtitle: 'Who ships the slurry, the drums and the hardware, and from which region.',
  searchHint: 'Name or e-mail',
  columns: (col) => [
    col.accessor('name', { id: 'name', header: 'Name', enableSorting: true, meta: { primary: true, flex: 1.8 } }),
    col.accessor('region', { id: 'region', header: 'Region', enableSorting: true, cell: (c) => regionLabel(c.getValue()), meta: { flex: 1 } }),
    col.accessor('contactEmail', { id: 'contactEmail', header: 'Contact', meta: { flex: 1.8 } }),
    col.accessor('notes', { id: 'notes', header: 'Notes', meta: { flex: 3, hideOnPhone: true } }),
    col.accessor('updatedAt', { id: 'updatedAt', header: 'Last changed', enableSorting: true, cell: (c) => formatDate(c.getValue()), meta: { flex: 1, hideOnPhone: true } }),
  ],
  defaultSort: { key: 'name', order: 'asc' },
  filters: ['region'],
  rowTestID: (s) => s.name,
  firstHint: 'with its region and contact',
});
