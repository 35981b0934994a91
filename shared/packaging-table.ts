// The packaging codes that exist. Single and composite packagings: UN Model Regulations 6.1.2.7 (the
// table of codes; 49 CFR 178.502 carries the same letters) [mem: the list recalled, as in
// ../shared/REFERENCES.md "Packaging codes, which combinations exist"; confirm against the current edition].
// IBCs: UN Model Regulations 6.5.1.4.3 / 49 CFR 178.702 [pub for 31HA1; mem for the rest].
// A code not listed here does not exist, however well formed.

export type PackagingGroup = 'single' | 'composite' | 'ibc';

export interface PackagingCodeEntry {
  code: string;
  group: PackagingGroup;
  kind: string;
  material: string;
  category: string | null;
  /** What the category numeral says, or for composites the outer packaging. */
  categoryLabel: string | null;
}

const TIGHT = 'tight head (non-removable head)';
const OPEN = 'open head (removable head)';

// [code, what its category numeral says]
const SINGLE: ReadonlyArray<readonly [string, string | null]> = [
  // 1 drums
  ['1A1', TIGHT],
  ['1A2', OPEN],
  ['1B1', TIGHT],
  ['1B2', OPEN],
  ['1D', null],
  ['1G', null],
  ['1H1', TIGHT],
  ['1H2', OPEN],
  ['1N1', TIGHT],
  ['1N2', OPEN],
  // 2 wooden barrels (49 CFR 178.502 still lists them; later UN editions may mark kind 2 reserved) [mem]
  ['2C1', 'bung type'],
  ['2C2', 'removable head'],
  // 3 jerricans: steel, aluminium and plastic only
  ['3A1', TIGHT],
  ['3A2', OPEN],
  ['3B1', TIGHT],
  ['3B2', OPEN],
  ['3H1', TIGHT],
  ['3H2', OPEN],
  // 4 boxes
  ['4A', null],
  ['4B', null],
  ['4C1', 'ordinary'],
  ['4C2', 'with sift-proof walls'],
  ['4D', null],
  ['4F', null],
  ['4G', null],
  ['4H1', 'expanded'],
  ['4H2', 'solid'],
  ['4N', null],
  // 5 bags
  ['5H1', 'woven, without inner liner or coating'],
  ['5H2', 'woven, sift-proof'],
  ['5H3', 'woven, water resistant'],
  ['5H4', 'film'],
  ['5L1', 'without inner liner or coating'],
  ['5L2', 'sift-proof'],
  ['5L3', 'water resistant'],
  ['5M1', 'ordinary'],
  ['5M2', 'water resistant'],
];

// Composites: 6, inner receptacle letter (H plastic, P glass), outer letter, outer form numeral.
const COMPOSITE: ReadonlyArray<readonly [string, string]> = [
  ['6HA1', 'steel drum'],
  ['6HA2', 'steel crate or box'],
  ['6HB1', 'aluminium drum'],
  ['6HB2', 'aluminium crate or box'],
  ['6HC', 'wooden box'],
  ['6HD1', 'plywood drum'],
  ['6HD2', 'plywood box'],
  ['6HG1', 'fibre drum'],
  ['6HG2', 'fibreboard box'],
  ['6HH1', 'plastic drum'],
  ['6HH2', 'solid plastic box'],
  ['6PA1', 'steel drum'],
  ['6PA2', 'steel crate or box'],
  ['6PB1', 'aluminium drum'],
  ['6PB2', 'aluminium crate or box'],
  ['6PC', 'wooden box'],
  ['6PD1', 'plywood drum'],
  ['6PD2', 'wickerwork hamper'],
  ['6PG1', 'fibre drum'],
  ['6PG2', 'fibreboard box'],
  ['6PH1', 'expanded plastic packaging'],
  ['6PH2', 'solid plastic packaging'],
];

const RIGID_PLASTIC_IBC: Readonly<Record<string, string>> = { '1': 'with structural equipment that bears the stacked load', '2': 'freestanding' };
const COMPOSITE_IBC: Readonly<Record<string, string>> = { '1': 'rigid inner receptacle', '2': 'flexible inner receptacle' };
const FLEXIBLE_IBC: ReadonlyArray<readonly [string, string]> = [
  ['13H1', 'woven plastic, without coating or liner'],
  ['13H2', 'woven plastic, coated'],
  ['13H3', 'woven plastic, with liner'],
  ['13H4', 'woven plastic, coated and with liner'],
  ['13H5', 'plastic film'],
  ['13L1', 'textile, without coating or liner'],
  ['13L2', 'textile, coated'],
  ['13L3', 'textile, with liner'],
  ['13L4', 'textile, coated and with liner'],
  ['13M1', 'paper, multiwall'],
  ['13M2', 'paper, multiwall, water resistant'],
];

function ibcEntries(): PackagingCodeEntry[] {
  const out: PackagingCodeEntry[] = [];
  const add = (code: string, categoryLabel: string | null) => {
    const type = code.slice(0, 2);
    const category = /\d$/.test(code.slice(2)) ? code.slice(-1) : null;
    out.push({ code, group: 'ibc', kind: type, material: code.slice(2, category ? -1 : undefined), category, categoryLabel });
  };
  for (const type of ['11', '21', '31']) {
    for (const metal of ['A', 'B', 'N']) add(`${type}${metal}`, null);
    for (const [n, label] of Object.entries(RIGID_PLASTIC_IBC)) add(`${type}H${n}`, label);
    for (const outer of ['A', 'B', 'C', 'D', 'F', 'G', 'H', 'N']) for (const [n, label] of Object.entries(COMPOSITE_IBC)) add(`${type}H${outer}${n}`, label);
  }
  // Fibreboard and wooden IBCs are for solids loaded by gravity only (type 11).
  for (const m of ['C', 'D', 'F']) add(`11${m}`, 'with inner liner');
  add('11G', null);
  for (const [code, label] of FLEXIBLE_IBC) add(code, label);
  return out;
}

function build(): ReadonlyMap<string, PackagingCodeEntry> {
  const map = new Map<string, PackagingCodeEntry>();
  for (const [code, categoryLabel] of SINGLE) {
    map.set(code, { code, group: 'single', kind: code[0]!, material: code[1]!, category: code[2] ?? null, categoryLabel });
  }
  for (const [code, outer] of COMPOSITE) {
    map.set(code, { code, group: 'composite', kind: '6', material: code.slice(1, 3), category: code[3] ?? null, categoryLabel: `in a ${outer}` });
  }
  for (const e of ibcEntries()) map.set(e.code, e);
  return map;
}

/** Every packaging code that exists, by code. */
export const PACKAGING_CODES: ReadonlyMap<string, PackagingCodeEntry> = build();

/** The codes of one kind (and, when given, one material), in table order. */
export function codesOf(kind: string, material?: string): PackagingCodeEntry[] {
  return [...PACKAGING_CODES.values()].filter((e) => e.kind === kind && (material === undefined || e.material === material));
}
