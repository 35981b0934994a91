import 'reflect-metadata';
import { plainToInstance } from 'class-transformer';
import { validateSync, type ValidationError } from 'class-validator';
import { ConnectorDto, DipTubeDto, DrumTypeDto } from '../../server/registry/registry.dto';
import { rowProblem } from '../../server/imports/row-rules';
import type { ImportKind } from '../../server/entities';
import { CONNECTOR_LIMITS, CONNECTOR_SAYS } from '../../shared/records/connector';
import { DIP_TUBE_SAYS } from '../../shared/records/dip-tube';
import { FIELD_SAYS } from '../../shared/records/field';

// The import's plain row rules beside the API's DTOs: for every row of a corpus of good and bad values,
// both name the same first field and the same message.

const SUPPLIER = '6f1c2a9e-3b4d-4c5e-8f70-123456789abc';
const BASE: Record<ImportKind, Record<string, unknown>> = {
  'dip-tubes': { partNumber: 'DT-1', supplierId: SUPPLIER, threadCode: 'NPS-2', lengthMm: 836, boreMm: 19, odMm: 25.4, material: 'PFA', keyCode: null, channels: 'feed' },
  connectors: {
    partNumber: 'DH-1',
    supplierId: SUPPLIER,
    keyCode: null,
    feedBoreMm: 19.05,
    feedNominal: '3/4 in',
    returnBoreMm: 12.7,
    returnNominal: '1/2 in',
    returnPath: 'open',
    suitedTo: 'both',
    wettedMaterials: 'PFA, PTFE',
  },
  'drum-types': {
    supplierId: SUPPLIER,
    region: 'EU',
    name: 'Drum',
    partNumber: 'DR-1',
    nominalCapacityL: 208,
    material: 'steel',
    head: 'tight',
    unPackagingCode: '1A1',
    outsideHeightMm: 880,
    insideDepthMm: 851,
    outsideDiameterMm: 585,
    openingLabel: 'large bung',
    openingThread: 'NPS-2',
    openingBoreMm: 50,
    openingKey: null,
    openingPosition: 'large',
  },
};

const long = (n: number) => 'x'.repeat(n);
/** Bad (and boundary) values tried in each field, one field at a time, and a few pairs. */
const TRIALS: unknown[] = [
  0,
  0.1,
  -1,
  0.05,
  201,
  251,
  501,
  2001,
  3000,
  3001,
  1e9,
  NaN,
  'text',
  '',
  long(20),
  long(21),
  long(40),
  long(41),
  long(60),
  long(61),
  long(121),
  long(201),
  null,
  'nope',
  'TW',
];

function dtoProblem(kind: ImportKind, v: Record<string, unknown>): { field: string; message: string } | null {
  const dto =
    kind === 'drum-types'
      ? {
          ...Object.fromEntries(Object.entries(v).filter(([k]) => !k.startsWith('opening'))),
          openings: [{ label: v.openingLabel, threadCode: v.openingThread, boreMm: v.openingBoreMm, keyCode: v.openingKey ?? null, position: v.openingPosition }],
        }
      : v;
  const cls = { 'dip-tubes': DipTubeDto, connectors: ConnectorDto, 'drum-types': DrumTypeDto }[kind];
  const first = (errors: ValidationError[]): { field: string; message: string } | null => {
    for (const e of errors) {
      if (e.constraints) return { field: e.property, message: Object.values(e.constraints)[0] };
      const inner = first(e.children ?? []);
      if (inner) return { field: `${e.property}.${inner.field}`, message: inner.message };
    }
    return null;
  };
  const p = first(validateSync(plainToInstance(cls as new () => object, dto), { whitelist: true }));
  if (!p) return null;
  const opening = p.field.match(/^openings\.0\.(\w+)$/);
  return opening ? { field: `opening${opening[1] === 'threadCode' ? 'Thread' : opening[1] === 'keyCode' ? 'Key' : opening[1][0].toUpperCase() + opening[1].slice(1)}`, message: p.message } : p;
}

describe('import row rules', () => {
  for (const kind of Object.keys(BASE) as ImportKind[]) {
    test(`${kind}: the same first problem as the API's DTO for every trial value`, () => {
      const base = BASE[kind];
      expect(rowProblem(kind, base)).toBeNull();
      expect(dtoProblem(kind, base)).toBeNull();
      let bad = 0;
      const fields = Object.keys(base);
      const rows: Array<Record<string, unknown>> = [];
      for (const f of fields) for (const t of TRIALS) rows.push({ ...base, [f]: t });
      for (const [i, f] of fields.entries()) rows.push({ ...base, [f]: 'nope', [fields[(i + 3) % fields.length]]: -1 });
      for (const row of rows) {
        const expected = dtoProblem(kind, row);
        const got = rowProblem(kind, row);
        const fieldProblem = got && !got.cross ? { field: got.field, message: got.message } : null;
        expect({ row, problem: fieldProblem }).toEqual({ row, problem: expected });
        if (expected) bad++;
      }
      // The corpus must mostly be bad rows, or the comparison proves little.
      expect(bad).toBeGreaterThan(rows.length / 2);
    });
  }

  test('rules across fields are reported after the field rules', () => {
    expect(rowProblem('dip-tubes', { ...BASE['dip-tubes'], boreMm: 30 })).toEqual({ field: 'boreMm', message: 'must be smaller than the outside diameter', cross: true });
    expect(rowProblem('connectors', { ...BASE.connectors, returnPath: 'none' })).toEqual({ field: 'returnBoreMm', message: 'must be empty when the head has no return path', cross: true });
    expect(rowProblem('drum-types', { ...BASE['drum-types'], insideDepthMm: 900 })).toEqual({ field: 'insideDepthMm', message: 'must be less than the outside height', cross: true });
  });

  test("the rules across fields are the records' own (shared/records), with their words", () => {
    expect(rowProblem('connectors', { ...BASE.connectors, returnBoreMm: null })).toEqual({ field: 'returnBoreMm', message: CONNECTOR_SAYS.returnBoreWith, cross: true });
    expect(rowProblem('dip-tubes', { ...BASE['dip-tubes'], boreMm: 25.4 })).toEqual({ field: 'boreMm', message: DIP_TUBE_SAYS.boreMm, cross: true });
    expect(rowProblem('dip-tubes', { ...BASE['dip-tubes'], boreMm: 25.3 })).toBeNull();
  });

  test("the field rules read the records' limits", () => {
    const max = CONNECTOR_LIMITS.feedBoreMaxMm;
    expect(rowProblem('connectors', { ...BASE.connectors, feedBoreMm: max })).toBeNull();
    expect(rowProblem('connectors', { ...BASE.connectors, feedBoreMm: max + 0.01 })).toEqual({ field: 'feedBoreMm', message: FIELD_SAYS.atMost(max, 'mm'), cross: false });
  });
});
