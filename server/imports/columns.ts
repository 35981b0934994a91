import type { ImportKind } from '../entities';

/** Headers are matched without regard to case, spacing and punctuation: "Inside Depth (mm)" -> insidedepthmm. */
export const normaliseHeader = (h: string) => h.toLowerCase().replace(/[^a-z0-9]/g, '');

export interface ColumnSpec {
  field: string;
  /** Accepted header spellings, already normalised. A length field is found as <name>mm or <name>in. */
  names: string[];
  kind: 'text' | 'number' | 'length' | 'code';
  required: boolean;
}

const text = (field: string, names: string[], required = true): ColumnSpec => ({ field, names, kind: 'text', required });
const number = (field: string, names: string[], required = true): ColumnSpec => ({ field, names, kind: 'number', required });
const length = (field: string, names: string[], required = true): ColumnSpec => ({ field, names, kind: 'length', required });

/** The columns of each kind; a Map, since the kind comes from the request. */
export const COLUMNS: ReadonlyMap<ImportKind, ColumnSpec[]> = new Map<ImportKind, ColumnSpec[]>([
  [
    'dip-tubes',
    [
      text('supplier', ['supplier', 'suppliername', 'vendor']),
      text('partNumber', ['partnumber', 'partno', 'part']),
      text('threadCode', ['thread', 'threadcode', 'threadspec']),
      length('lengthMm', ['length', 'lengthseattotip', 'seattotip']),
      length('boreMm', ['bore', 'id', 'insidediameter']),
      length('odMm', ['od', 'outsidediameter']),
      text('material', ['material']),
      text('keyCode', ['key', 'keycode'], false),
      text('channels', ['channels', 'channel']),
    ],
  ],
  [
    'connectors',
    [
      text('supplier', ['supplier', 'suppliername', 'vendor']),
      text('partNumber', ['partnumber', 'partno', 'part']),
      text('keyCode', ['key', 'keycode'], false),
      length('feedBoreMm', ['feedbore', 'feed']),
      text('feedNominal', ['feednominal', 'feedsize']),
      length('returnBoreMm', ['returnbore', 'return'], false),
      text('returnNominal', ['returnnominal', 'returnsize'], false),
      text('returnPath', ['returnpath']),
      text('suitedTo', ['suitedto', 'tapping']),
      text('wettedMaterials', ['wettedmaterials', 'wetted', 'materials']),
    ],
  ],
  [
    'drum-types',
    [
      text('supplier', ['supplier', 'suppliername', 'vendor']),
      text('partNumber', ['partnumber', 'partno', 'part']),
      text('name', ['name', 'drumname', 'description']),
      text('region', ['region']),
      number('nominalCapacityL', ['capacityl', 'nominalcapacityl', 'capacity']),
      text('material', ['material']),
      text('head', ['head']),
      text('unPackagingCode', ['uncode', 'unpackagingcode', 'packagingcode'], false),
      length('outsideHeightMm', ['outsideheight', 'height']),
      length('insideDepthMm', ['insidedepth', 'depth']),
      length('outsideDiameterMm', ['outsidediameter', 'diameter', 'od']),
      text('openingLabel', ['openinglabel', 'opening', 'bung']),
      text('openingThread', ['openingthread', 'thread', 'threadcode']),
      length('openingBoreMm', ['openingbore', 'bore']),
      text('openingKey', ['openingkey', 'key', 'keycode'], false),
      text('openingPosition', ['openingposition', 'position']),
    ],
  ],
]);

/** The header of the downloadable template for each kind, in mm. */
export function templateCsv(kind: ImportKind): string {
  const header = COLUMNS.get(kind)!
    .map((c) => (c.kind === 'length' ? `${toSnake(c.field.replace(/Mm$/, ''))}_mm` : toSnake(c.field)))
    .join(',');
  const example = new Map<ImportKind, string>(
    Object.entries({
      'dip-tubes': 'Example Tube Works,DT-EX-0001,NPS-2,836,19,25.4,PFA,,feed',
      connectors: 'Example Tube Works,DH-EX-0001,,19.05,3/4 in,19.05,3/4 in,open,both,"PFA, PTFE, FFKM seals"',
      'drum-types':
        'Example Drum Co,DR-EX-208,Example 208 L steel tight head,NA,208,steel,tight,1A1,880,851,585,large bung,NPS-2,50,,large\n' +
        'Example Drum Co,DR-EX-208,Example 208 L steel tight head,NA,208,steel,tight,1A1,880,851,585,small bung,NPS-3/4,19,,small',
    }) as Array<[ImportKind, string]>,
  );
  const note = new Map<ImportKind, string>(
    Object.entries({
      'dip-tubes': '',
      connectors: '',
      // Drum types: one row per opening; rows with the same supplier and part number make one drum type.
      'drum-types': '',
    }) as Array<[ImportKind, string]>,
  );
  return `${header}\n${example.get(kind)}\n${note.get(kind)}`.trimEnd() + '\n';
}

function toSnake(s: string): string {
  return s.replace(/[A-Z]/g, (c) => `_${c.toLowerCase()}`);
}
