// The invented demo registry for Larkspur Ridge Fab 3: suppliers, drums, dip tubes, dispense heads,
// pairings, slurries, stations and tube sets. Every company, part number, product and place is made up.
//
// Why the scenario looks the way it does (site clearance window 5 to 25 mm, so a tube fits a drum when
// insideDepth - 25 <= length <= insideDepth - 5):
// - Thread: NPS-2, G-2 and BT-56x4/BT-70x6 tubes exist, so a tube offered to a drum of another family
//   (a G-2 tube in an NPS-2 drum) fails on thread, never on "2 in looks like 2 in".
// - Reach: the three NPS-2 drums are not the same depth. The 55 gal steel drum (851 mm) takes the 836 mm
//   tube; the twin-bung plastic drum (870 mm) needs the 855 mm tube, which bottoms out in the steel drum;
//   the legacy 790 mm tube reaches neither. The Korean steel drum has the same G 2 bung as the European
//   one but is shallower (818 mm), so both site G-2 tubes (830 and 825 mm) bottom out: no approved tube
//   fits it, which is the "new supplier, same thread, still no fit" case.
// - Key: three collar keys (oxide, metal, ceria lines). The Korean drum carries no collars at all, and
//   the copper-barrier head is unkeyed, so keyed tube + unkeyed head gives a key caution.
// - Tapping and ports: 'Ceria STI feed C' taps one opening (the stirrer takes the other) but has the
//   3/4 in + 1/2 in head built for two-opening tapping installed: tapping fails and its restricted
//   return fails the ports rule. 'Cu barrier feed D' runs a 3/4 in + 5/8 in head in one opening: the
//   return is 1.44 times as fast as the feed, a caution. A retired legacy head with a 3/8 in return
//   (ratio above the limit of 4) is kept to show a hard ports fail.
// - Openings: two-opening tapping needs two openings that take the tube's thread, so the two-opening
//   station ('Tungsten CMP feed B') runs the plastic drum with twin 2 in bungs; the same tube in the
//   2 in + 3/4 in steel drum fails the openings rule.
// - Foam: the copper-barrier slurry foams; it is fine at its own pumped station, but offered to the
//   mechanically stirred ceria station it fails. The ceria slurry is shear-sensitive.
// - Approval: mostly approved pairings (four eyes: author and approver differ), two drafts (caution) and
//   one retired (fail).
// - Rinse: at every station Set A (online) and Set B (standby) were rinsed after their last drum; Set C
//   (cleaning) came off a drum after its last rinse, so it is dirty and fails the rinse rule.

import type { EntityManager } from 'typeorm';
import type { ConnectorRecord, DrumTypeRecord, OpeningRecord, StationRecord } from '../shared/contract';
import type { SlurryProperties } from '../shared/records/slurry';
import { Connector, DipTube, DrumOpening, DrumType, KeyCode, Pairing, PairingReview, Slurry, Station, Supplier, ThreadSpec, TubeSet, type Region } from '../server/entities/registry';

/** The scenario's "now": every date below is a fixed offset from it, so the data is deterministic. */
export const DEMO_NOW = new Date('2026-11-20T06:00:00Z');
const HOUR_MS = 3_600_000;
const hoursAgo = (h: number): Date => new Date(DEMO_NOW.getTime() - h * HOUR_MS);
const daysAgo = (d: number): Date => hoursAgo(d * 24);

const IN = 25.4; // mm per inch

// ---------------------------------------------------------------------------------------------------
// Suppliers

type SupplierRef = 'cobaltMesa' | 'auenfeld' | 'kumoyama' | 'hsinpu' | 'seoripul' | 'ridgeback' | 'aarvik';

// Each supplier's contact address is a mailbox at its own made-up domain, <ref in lower case>.example.
const SUPPLIERS: Array<{ ref: SupplierRef; name: string; region: Region; mailbox: string; notes: string }> = [
  { ref: 'cobaltMesa', name: 'Cobalt Mesa Abrasives', region: 'NA', mailbox: 'orders', notes: 'Oxide and tungsten slurries; ships in lined steel or HDPE 55 gal drums.' },
  { ref: 'auenfeld', name: 'Auenfeld Fasswerk', region: 'EU', mailbox: 'service', notes: 'Lined steel drum maker; the G-2 dip tubes were bought for its drums. No slurry currently on contract.' },
  { ref: 'kumoyama', name: 'Kumoyama Fine Chemical', region: 'JP', mailbox: 'export', notes: 'Ceria slurries in 200 L HDPE drums with buttress bungs.' },
  { ref: 'hsinpu', name: 'Hsinpu Polishing Materials', region: 'TW', mailbox: 'cs', notes: 'Copper barrier slurry in 20 L containers.' },
  { ref: 'seoripul', name: 'Seoripul Surface Chemistry', region: 'KR', mailbox: 'global', notes: 'Second-source STI slurry under qualification; drums arrive without site key collars.' },
  { ref: 'ridgeback', name: 'Ridgeback Fluid Hardware', region: 'NA', mailbox: 'quotes', notes: 'Dip tubes and dispense heads for NPS and buttress bungs.' },
  { ref: 'aarvik', name: 'Aarvik Fluid Components', region: 'EU', mailbox: 'sales', notes: 'Dip tubes and dispense heads for G-thread bungs.' },
];

// ---------------------------------------------------------------------------------------------------
// Key codes: the site's own collar scheme, one colour per slurry line.

type KeyRef = 'oxide' | 'metal' | 'ceria';

const KEY_CODES: Array<{ ref: KeyRef; code: string; label: string; marking: string }> = [
  { ref: 'oxide', code: 'LR-OCHRE', label: 'Oxide and STI silica line', marking: "ochre collar, single lug at 12 o'clock" },
  { ref: 'metal', code: 'LR-SLATE', label: 'Metal line (tungsten, copper barrier)', marking: "slate-grey collar, twin lugs at 4 and 8 o'clock" },
  { ref: 'ceria', code: 'LR-MOSS', label: 'Ceria line', marking: "moss-green collar, wide lug at 3 o'clock" },
];

// ---------------------------------------------------------------------------------------------------
// Drum types and their openings. Inside depth runs from the bung seat to the inside bottom.

type DrumRef = 'naSteel' | 'euSteel' | 'jpPlastic' | 'twSmall' | 'naPlasticTwin' | 'krSteel';

/** Nominal capacity in litres, then outside height, inside depth, outside diameter and inside diameter in mm. */
type DrumSize = [nominalCapacityL: number, outsideHeightMm: number, insideDepthMm: number, outsideDiameterMm: number, insideDiameterMm: number];

interface DrumRow extends Pick<DrumTypeRecord, 'name' | 'partNumber'> {
  ref: DrumRef;
  supplier: SupplierRef;
  material: 'steel' | 'plastic';
  size: DrumSize;
}

// Every demo drum is a tight head, made by its supplier in the supplier's region.
const DRUMS: DrumRow[] = [
  // 55 US gal steel drum: inside about 33.5 in (851 mm), 2 in + 3/4 in straight pipe thread bungs.
  { ref: 'naSteel', supplier: 'cobaltMesa', name: '55 gal lined steel tight head, 2 in + 3/4 in NPS', partNumber: 'CMA-D208-SL', material: 'steel', size: [208, 880, 851, 585, 571] },
  // European steel drum, G 2 and G 3/4 closures to ISO 228-1.
  { ref: 'euSteel', supplier: 'auenfeld', name: '216.5 L lined steel tight head, G 2 + G 3/4', partNumber: 'AFW-216-G2G34', material: 'steel', size: [216.5, 874, 845, 584, 566] },
  // HDPE drum with buttress bungs; the head goes in the 56x4 bung, the stirrer in the 70x6 bung.
  { ref: 'jpPlastic', supplier: 'kumoyama', name: '200 L HDPE tight head, 56x4 + 70x6 buttress', partNumber: 'KFC-P200-B5670', material: 'plastic', size: [200, 935, 880, 581, 555] },
  // Small round HDPE container with a single centre bung.
  { ref: 'twSmall', supplier: 'hsinpu', name: '20 L HDPE tight head, single 56x4 buttress', partNumber: 'HPM-C20-B56', material: 'plastic', size: [20, 400, 380, 290, 272] },
  // 55 gal HDPE drum with two 2 in bungs: the only NPS-2 drum that two-opening tapping can use.
  { ref: 'naPlasticTwin', supplier: 'cobaltMesa', name: '55 gal HDPE tight head, twin 2 in NPS', partNumber: 'CMA-D208-PT', material: 'plastic', size: [208, 915, 870, 584, 560] },
  // Same G 2 + G 3/4 bungs as the European drum but shallower, and no key collars.
  { ref: 'krSteel', supplier: 'seoripul', name: '200 L steel tight head, G 2 + G 3/4', partNumber: 'SSC-D200-G2', material: 'steel', size: [200, 850, 818, 571, 556] },
];

/** UN packaging code of a tight-head drum by material: drum (1), steel (A) or plastic (H), non-removable head (1). */
const TIGHT_HEAD_UN_CODE: Record<DrumRow['material'], string> = { steel: '1A1', plastic: '1H1' };

const OPENINGS: Array<{ drum: DrumRef; label: string; thread: string; boreMm: number; key: KeyRef | null; position: OpeningRecord['position'] }> = [
  { drum: 'naSteel', label: 'large bung', thread: 'NPS-2', boreMm: 50, key: 'oxide', position: 'large' },
  { drum: 'naSteel', label: 'small bung', thread: 'NPS-3/4', boreMm: 19, key: null, position: 'small' },
  { drum: 'euSteel', label: 'G 2 bung', thread: 'G-2', boreMm: 52, key: 'metal', position: 'large' },
  { drum: 'euSteel', label: 'G 3/4 bung', thread: 'G-3/4', boreMm: 19, key: null, position: 'small' },
  { drum: 'jpPlastic', label: '56x4 bung', thread: 'BT-56x4', boreMm: 48, key: 'ceria', position: 'large' },
  { drum: 'jpPlastic', label: '70x6 bung', thread: 'BT-70x6', boreMm: 60, key: null, position: 'small' },
  { drum: 'twSmall', label: 'centre bung', thread: 'BT-56x4', boreMm: 48, key: 'metal', position: 'center' },
  { drum: 'naPlasticTwin', label: 'bung A', thread: 'NPS-2', boreMm: 50, key: 'metal', position: 'large' },
  { drum: 'naPlasticTwin', label: 'bung B', thread: 'NPS-2', boreMm: 50, key: 'metal', position: 'large' },
  { drum: 'krSteel', label: 'G 2 bung', thread: 'G-2', boreMm: 52, key: null, position: 'large' },
  { drum: 'krSteel', label: 'G 3/4 bung', thread: 'G-3/4', boreMm: 19, key: null, position: 'small' },
];

// ---------------------------------------------------------------------------------------------------
// Dip tubes. Comments give the tip gap (insideDepth - length) in the drum each tube is meant for.

type TubeRef = 'n836' | 'n790' | 'n855' | 'n841' | 'g830' | 'g825' | 'b56x865' | 'b70x862' | 'b56x368' | 'b56x372';

interface TubeRow {
  ref: TubeRef;
  partNumber: string;
  supplier: SupplierRef;
  thread: string;
  lengthMm: number;
  boreMm: number;
  odMm: number;
  material: string;
  key: KeyRef | null;
  channels: 'feed' | 'feed-return';
}

const TUBES: TubeRow[] = [
  // naSteel 851: gap 15. In the twin drum (870) the gap is 34: too short.
  { ref: 'n836', partNumber: 'RFH-DT-N2-836', supplier: 'ridgeback', thread: 'NPS-2', lengthMm: 836, boreMm: 19, odMm: 25.4, material: 'PFA', key: 'oxide', channels: 'feed-return' },
  // Legacy tube for an older, shallower drum: gap 61 in naSteel, 80 in the twin drum. Too short for both.
  { ref: 'n790', partNumber: 'RFH-DT-N2-790', supplier: 'ridgeback', thread: 'NPS-2', lengthMm: 790, boreMm: 19, odMm: 25.4, material: 'PFA', key: 'oxide', channels: 'feed' },
  // naPlasticTwin 870: gap 15. In naSteel (851) it is 4 mm longer than the drum is deep.
  { ref: 'n855', partNumber: 'RFH-DT-N2-855', supplier: 'ridgeback', thread: 'NPS-2', lengthMm: 855, boreMm: 19, odMm: 25.4, material: 'PFA', key: 'metal', channels: 'feed' },
  // naSteel 851: gap 10. Twin drum: gap 29, too short.
  { ref: 'n841', partNumber: 'RFH-DT-N2-841', supplier: 'ridgeback', thread: 'NPS-2', lengthMm: 841, boreMm: 19, odMm: 25.4, material: 'PVDF', key: 'oxide', channels: 'feed' },
  // euSteel 845: gap 15. krSteel 818: 12 mm too long.
  { ref: 'g830', partNumber: 'AFC-TR-G2-830', supplier: 'aarvik', thread: 'G-2', lengthMm: 830, boreMm: 19, odMm: 25.4, material: 'PVDF', key: 'metal', channels: 'feed-return' },
  // euSteel 845: gap 20. krSteel 818: 7 mm too long.
  { ref: 'g825', partNumber: 'AFC-TR-G2-825', supplier: 'aarvik', thread: 'G-2', lengthMm: 825, boreMm: 19, odMm: 25.4, material: 'PVDF', key: null, channels: 'feed' },
  // jpPlastic 880 (56x4 bung): gap 15.
  { ref: 'b56x865', partNumber: 'RFH-DT-B56-865', supplier: 'ridgeback', thread: 'BT-56x4', lengthMm: 865, boreMm: 19, odMm: 25.4, material: 'PFA', key: 'ceria', channels: 'feed-return' },
  // jpPlastic 880 (70x6 bung): gap 18.
  { ref: 'b70x862', partNumber: 'RFH-DT-B70-862', supplier: 'ridgeback', thread: 'BT-70x6', lengthMm: 862, boreMm: 22, odMm: 28, material: 'HDPE', key: null, channels: 'feed' },
  // twSmall 380: gap 12.
  { ref: 'b56x368', partNumber: 'RFH-DT-B56-368', supplier: 'ridgeback', thread: 'BT-56x4', lengthMm: 368, boreMm: 15.9, odMm: 22.2, material: 'PFA', key: 'metal', channels: 'feed-return' },
  // twSmall 380: gap 8.
  { ref: 'b56x372', partNumber: 'RFH-DT-B56-372', supplier: 'ridgeback', thread: 'BT-56x4', lengthMm: 372, boreMm: 15.9, odMm: 22.2, material: 'HDPE', key: null, channels: 'feed' },
];

// ---------------------------------------------------------------------------------------------------
// Dispense heads. Every demo head feeds through 3/4 in; a bore is its nominal in mm (3/4 in = 19.05 mm,
// 5/8 in = 15.875 mm, 1/2 in = 12.7 mm) unless the row gives a worn one.

type HeadRef = 'combinedOxide' | 'split' | 'feedOnlyMetal' | 'combinedEu' | 'combinedCeria' | 'reducedReturn' | 'combinedUnkeyed' | 'legacyNarrow';

const BORE_MM = { '3/4 in': 0.75 * IN, '5/8 in': 0.625 * IN, '1/2 in': 0.5 * IN, '3/8 in': 0.375 * IN } as const;
type BoreNominal = keyof typeof BORE_MM;
const HEAD_FEED: BoreNominal = '3/4 in';

interface HeadRow extends Pick<ConnectorRecord, 'partNumber' | 'returnPath' | 'suitedTo' | 'wettedMaterials'> {
  ref: HeadRef;
  supplier: SupplierRef;
  key: KeyRef | null;
  returnNominal: BoreNominal | null;
  wornReturnBoreMm?: number;
}

const HEADS: HeadRow[] = [
  // Equal 3/4 + 3/4 in ports: return no faster than feed; fine in one opening.
  { ref: 'combinedOxide', partNumber: 'RFH-DH-C1919-OX', supplier: 'ridgeback', key: 'oxide', returnNominal: '3/4 in', returnPath: 'open', suitedTo: 'both', wettedMaterials: 'PFA, PTFE, FFKM seals' },
  // Feed 3/4 in with a separate 1/2 in return, built for two-opening tapping: (19.05/12.7)^2 = 2.25.
  {
    ref: 'split',
    partNumber: 'RFH-DH-S1913-CE',
    supplier: 'ridgeback',
    key: 'ceria',
    returnNominal: '1/2 in',
    returnPath: 'restricted',
    suitedTo: 'two-opening',
    wettedMaterials: 'PFA, PTFE, FFKM seals',
  },
  // Feed only; the return goes back through the drum's second bung.
  {
    ref: 'feedOnlyMetal',
    partNumber: 'RFH-DH-F19-MT',
    supplier: 'ridgeback',
    key: 'metal',
    returnNominal: null,
    returnPath: 'none',
    suitedTo: 'two-opening',
    wettedMaterials: 'PFA, PTFE, EPDM seals',
  },
  {
    ref: 'combinedEu',
    partNumber: 'AFC-KH-1919-MT',
    supplier: 'aarvik',
    key: 'metal',
    returnNominal: '3/4 in',
    returnPath: 'open',
    suitedTo: 'one-opening',
    wettedMaterials: 'PVDF, PTFE, FFKM seals',
  },
  { ref: 'combinedCeria', partNumber: 'RFH-DH-C1919-CE', supplier: 'ridgeback', key: 'ceria', returnNominal: '3/4 in', returnPath: 'open', suitedTo: 'both', wettedMaterials: 'PFA, PTFE, FFKM seals' },
  // 3/4 in feed, 5/8 in return, open: (19.05/15.875)^2 = 1.44, a caution in one opening. Unkeyed.
  { ref: 'reducedReturn', partNumber: 'AFC-KH-1916', supplier: 'aarvik', key: null, returnNominal: '5/8 in', returnPath: 'open', suitedTo: 'both', wettedMaterials: 'PFA, PVDF, FFKM seals' },
  { ref: 'combinedUnkeyed', partNumber: 'RFH-DH-C1919-U', supplier: 'ridgeback', key: null, returnNominal: '3/4 in', returnPath: 'open', suitedTo: 'both', wettedMaterials: 'PFA, PTFE, FFKM seals' },
  // Legacy head, 3/8 in return worn to 9.4 mm: (19.05/9.4)^2 = 4.1, above the site limit of 4.
  {
    ref: 'legacyNarrow',
    partNumber: 'RFH-DH-C1909-OX',
    supplier: 'ridgeback',
    key: 'oxide',
    returnNominal: '3/8 in',
    wornReturnBoreMm: 9.4,
    returnPath: 'open',
    suitedTo: 'both',
    wettedMaterials: 'PFA, PTFE, Viton seals',
  },
];

// ---------------------------------------------------------------------------------------------------
// Pairings (tube + head). Approved ones are authored by the first engineer and approved by the second.

const PAIRINGS: Array<{ tube: TubeRef; head: HeadRef; status: 'draft' | 'approved' | 'retired'; approvedDaysAgo: number | null; notes: string; review: string | null }> = [
  {
    tube: 'n836',
    head: 'combinedOxide',
    status: 'approved',
    approvedDaysAgo: 210,
    notes: 'Standard oxide pairing for the 55 gal steel drum.',
    review: 'Seal stack and keying checked on a filled drum; no weeping at the bung.',
  },
  {
    tube: 'n841',
    head: 'combinedOxide',
    status: 'approved',
    approvedDaysAgo: 180,
    notes: 'Alternate PVDF tube for the 55 gal steel drum.',
    review: 'Tip clearance 10 mm confirmed with a dipstick on three drums.',
  },
  {
    tube: 'n855',
    head: 'feedOnlyMetal',
    status: 'approved',
    approvedDaysAgo: 150,
    notes: 'Tungsten line, twin-bung HDPE drum; return through bung B.',
    review: 'Return line and vent on bung B checked; feed only head confirmed.',
  },
  { tube: 'b56x865', head: 'combinedCeria', status: 'approved', approvedDaysAgo: 140, notes: 'Ceria 200 L HDPE drum, 56x4 bung.', review: 'Buttress engagement checked; collar lug seats fully.' },
  {
    tube: 'b56x865',
    head: 'split',
    status: 'approved',
    approvedDaysAgo: 120,
    notes: 'For two-opening tapping only: the 1/2 in return is not meant to carry the recirculation.',
    review: 'Approved for two-opening tapping; do not use where the head carries the return.',
  },
  { tube: 'g830', head: 'combinedEu', status: 'approved', approvedDaysAgo: 400, notes: 'Bought for the European 216.5 L drum.', review: 'G 2 thread engagement and collar checked.' },
  {
    tube: 'b56x368',
    head: 'reducedReturn',
    status: 'approved',
    approvedDaysAgo: 90,
    notes: 'Copper barrier 20 L container; the 5/8 in return raises return velocity, keep flow low.',
    review: 'Accepted with the reduced return; flow limited to 8 L/min at the station.',
  },
  { tube: 'b56x372', head: 'reducedReturn', status: 'approved', approvedDaysAgo: 60, notes: 'Unkeyed spare tube for the 20 L container.', review: 'Spare tube accepted; keying collar on order.' },
  { tube: 'g825', head: 'combinedUnkeyed', status: 'approved', approvedDaysAgo: 365, notes: 'Unkeyed G 2 spare.', review: 'Spare set accepted for G 2 drums.' },
  { tube: 'b70x862', head: 'combinedUnkeyed', status: 'draft', approvedDaysAgo: null, notes: 'Proposed: draw from the 70x6 bung when the 56x4 bung carries a stirrer.', review: null },
  { tube: 'n790', head: 'combinedOxide', status: 'draft', approvedDaysAgo: null, notes: 'Found in stores; length to be checked against current drums before approval.', review: null },
  {
    tube: 'n836',
    head: 'legacyNarrow',
    status: 'retired',
    approvedDaysAgo: 900,
    notes: 'Retired: the worn 3/8 in return sprayed slurry back into the drum.',
    review: 'Retired after return velocity above the site limit; heads quarantined.',
  },
];

// ---------------------------------------------------------------------------------------------------
// Slurries (the drum is the one each arrives in). The EU drum has no slurry on contract.

type SlurryRef = 'oxide' | 'tungsten' | 'ceria' | 'cuBarrier' | 'sti';

// Receiving: shelf life and the life a lot must still have on arrival, storage range, and whether the dock needs
// the certificate of analysis. The two certificate slurries give the "hold until attached" case; the oxide
// slurry's 90-day minimum the "too close to expiry" case; every lot may trip or freeze its indicator.
interface SlurryRow {
  ref: SlurryRef;
  name: string;
  supplier: SupplierRef;
  drum: DrumRef;
  foams: boolean;
  shearSensitive: boolean;
  solidsWtPct: number;
  shelfLifeDays: number;
  minRemainingDays: number;
  storageMinC: number;
  storageMaxC: number;
  certificateRequired: boolean;
  /** Its own properties, invented but in the usual range of CMP slurries [practice] (shared/records/slurry.ts). */
  props: SlurryProperties;
}

const newtonian = (viscosityMPaS: number) => ({ viscosityModel: 'newtonian' as const, viscosityMPaS, consistencyPaSn: null, flowIndex: null });
const powerLaw = (consistencyPaSn: number, flowIndex: number) => ({ viscosityModel: 'power-law' as const, viscosityMPaS: null, consistencyPaSn, flowIndex });

const SLURRIES: SlurryRow[] = [
  {
    ref: 'oxide',
    name: 'Mesa OxPlane 30 fumed silica',
    supplier: 'cobaltMesa',
    drum: 'naSteel',
    foams: false,
    shearSensitive: false,
    solidsWtPct: 12.5,
    shelfLifeDays: 365,
    minRemainingDays: 90,
    storageMinC: 5,
    storageMaxC: 35,
    certificateRequired: false,
    props: {
      densityKgM3: 1080,
      ...newtonian(3),
      particleSizeNm: 140,
      minVelocityMs: 0.3,
      maxVelocityMs: 2.5,
      maxWallShearPerS: 20000,
      minTurnovers: 3,
      minRecircMinutes: 20,
      phMin: 10,
      phMax: 11.5,
      oxidiser: 'none',
      solventWtPct: 0,
    },
  },
  {
    ref: 'tungsten',
    name: 'Mesa WPlane 18 tungsten',
    supplier: 'cobaltMesa',
    drum: 'naPlasticTwin',
    foams: false,
    shearSensitive: false,
    solidsWtPct: 3,
    shelfLifeDays: 180,
    minRemainingDays: 60,
    storageMinC: 5,
    storageMaxC: 25,
    certificateRequired: true,
    props: {
      densityKgM3: 1030,
      ...newtonian(2.2),
      particleSizeNm: 180,
      minVelocityMs: 0.3,
      maxVelocityMs: 3,
      maxWallShearPerS: 30000,
      minTurnovers: 2,
      minRecircMinutes: 15,
      phMin: 2,
      phMax: 3.5,
      oxidiser: 'strong',
      solventWtPct: 0,
    },
  },
  {
    ref: 'ceria',
    name: 'Kumoyama CeriaFine 05',
    supplier: 'kumoyama',
    drum: 'jpPlastic',
    foams: false,
    shearSensitive: true,
    solidsWtPct: 1,
    shelfLifeDays: 270,
    minRemainingDays: 60,
    storageMinC: 5,
    storageMaxC: 30,
    certificateRequired: false,
    props: {
      densityKgM3: 1010,
      ...powerLaw(0.012, 0.8),
      particleSizeNm: 120,
      minVelocityMs: 0.2,
      maxVelocityMs: 1.2,
      maxWallShearPerS: 4000,
      minTurnovers: 4,
      minRecircMinutes: 30,
      phMin: 4,
      phMax: 6,
      oxidiser: 'none',
      solventWtPct: 0,
    },
  },
  {
    ref: 'cuBarrier',
    name: 'Hsinpu CuBar B7 barrier',
    supplier: 'hsinpu',
    drum: 'twSmall',
    foams: true,
    shearSensitive: false,
    solidsWtPct: 6,
    shelfLifeDays: 120,
    minRemainingDays: 30,
    storageMinC: 2,
    storageMaxC: 25,
    certificateRequired: false,
    props: {
      densityKgM3: 1040,
      ...newtonian(1.8),
      particleSizeNm: 60,
      minVelocityMs: 0.3,
      maxVelocityMs: 2,
      maxWallShearPerS: 15000,
      minTurnovers: 2,
      minRecircMinutes: 10,
      phMin: 9.5,
      phMax: 10.5,
      oxidiser: 'mild',
      solventWtPct: 0,
    },
  },
  {
    ref: 'sti',
    name: 'Seoripul STI-Select 3',
    supplier: 'seoripul',
    drum: 'krSteel',
    foams: false,
    shearSensitive: false,
    solidsWtPct: 2.5,
    shelfLifeDays: 365,
    minRemainingDays: 120,
    storageMinC: 5,
    storageMaxC: 30,
    certificateRequired: true,
    props: {
      densityKgM3: 1020,
      ...powerLaw(0.02, 0.75),
      particleSizeNm: 150,
      minVelocityMs: 0.25,
      maxVelocityMs: 1.5,
      maxWallShearPerS: 6000,
      minTurnovers: 3,
      minRecircMinutes: 20,
      phMin: 3.5,
      phMax: 5,
      oxidiser: 'none',
      solventWtPct: 0,
    },
  },
];

// ---------------------------------------------------------------------------------------------------
// Stations and their tube sets. Set A online and Set B standby were rinsed after their last drum;
// Set C (cleaning) came off a drum after its last rinse, so it is dirty.

type Rinser = 'clerk' | 'engineer';

interface StationRow extends Pick<StationRecord, 'name' | 'bay' | 'tapping' | 'agitation' | 'flowLpm' | 'lineLengthM' | 'lineBoreMm' | 'lineRoughnessUm'> {
  head: HeadRef;
  /** The drum the station normally runs; its tube sets fit it. */
  usualDrum: DrumRef;
}

const STATIONS: StationRow[] = [
  {
    name: 'Oxide CMP feed A',
    bay: 'Subfab bay 2 west',
    tapping: 'one-opening',
    agitation: 'pump',
    head: 'combinedOxide',
    flowLpm: 20,
    lineLengthM: 14,
    lineBoreMm: 15.8,
    lineRoughnessUm: 1.5,
    usualDrum: 'naSteel',
  },
  {
    name: 'Tungsten CMP feed B',
    bay: 'Subfab bay 3 east',
    tapping: 'two-opening',
    agitation: 'pump',
    head: 'feedOnlyMetal',
    flowLpm: 18,
    lineLengthM: 22,
    lineBoreMm: 15.8,
    lineRoughnessUm: 1.5,
    usualDrum: 'naPlasticTwin',
  },
  {
    name: 'Ceria STI feed C',
    bay: 'Subfab bay 3 west',
    tapping: 'one-opening',
    agitation: 'mechanical',
    head: 'split',
    flowLpm: 12,
    lineLengthM: 9,
    lineBoreMm: 12.7,
    lineRoughnessUm: 1.5,
    usualDrum: 'jpPlastic',
  },
  {
    name: 'Cu barrier feed D',
    bay: 'Subfab bay 4',
    tapping: 'one-opening',
    agitation: 'pump',
    head: 'reducedReturn',
    flowLpm: 8,
    lineLengthM: 6,
    lineBoreMm: 9.5,
    lineRoughnessUm: 1.5,
    usualDrum: 'twSmall',
  },
];

type SetRow = [tube: TubeRef, usedHoursAgo: number, rinsedHoursAgo: number, rinsedBy: Rinser];
const SET_STATES = [
  { label: 'Set A', state: 'online' },
  { label: 'Set B', state: 'standby' },
  { label: 'Set C', state: 'cleaning' },
] as const;
/** A station's three sets, in this order: Set A online, Set B standby, Set C cleaning. */
const sets = (...rows: [SetRow, SetRow, SetRow]) => rows.map(([tube, usedHoursAgo, rinsedHoursAgo, rinsedBy], i) => ({ ...SET_STATES[i], tube, usedHoursAgo, rinsedHoursAgo, rinsedBy }));

const TUBE_SETS: Record<string, ReturnType<typeof sets>> = {
  'Oxide CMP feed A': sets(['n836', 50, 47, 'clerk'], ['n836', 122, 118, 'clerk'], ['n841', 3, 98, 'clerk']),
  'Tungsten CMP feed B': sets(['n855', 30, 27, 'clerk'], ['n855', 100, 96, 'engineer'], ['n855', 2, 76, 'clerk']),
  'Ceria STI feed C': sets(['b56x865', 70, 66, 'engineer'], ['b56x865', 150, 146, 'clerk'], ['b56x865', 5, 140, 'clerk']),
  'Cu barrier feed D': sets(['b56x368', 20, 18, 'clerk'], ['b56x372', 44, 42, 'clerk'], ['b56x368', 1, 26, 'clerk']),
};

// ---------------------------------------------------------------------------------------------------

function partOf<T extends { ref: string; partNumber: string }>(rows: readonly T[], ref: T['ref']): string {
  const row = rows.find((r) => r.ref === ref);
  if (!row) throw new Error(`demo registry: no row ${ref}`);
  return row.partNumber;
}

/** Well-known demo records that tests and walkthroughs can rely on, by name or part number. */
export const DEMO_REGISTRY_SUMMARY = {
  /** NA 55 gal steel drum (NPS-2 + NPS-3/4, 851 mm): fittingTube + fittingHead at fittingStation fits. */
  fittingDrum: partOf(DRUMS, 'naSteel'),
  /** 836 mm oxide-keyed tube, approved with fittingHead; 15 mm tip gap in fittingDrum. */
  fittingTube: partOf(TUBES, 'n836'),
  /** Equal 3/4 + 3/4 in combined head, return open, suited to both tappings. */
  fittingHead: partOf(HEADS, 'combinedOxide'),
  /** One-opening pumped station whose installed head is fittingHead. */
  fittingStation: 'Oxide CMP feed A',
  /** Korean steel drum (G-2, 818 mm, no key collars): every approved G-2 tube is too long, so nothing fits. */
  foreignDrum: partOf(DRUMS, 'krSteel'),
  /** The slurry that arrives in foreignDrum. */
  foreignSlurry: 'Seoripul STI-Select 3',
  /** EU 216.5 L steel drum the G-2 tubes were sized for (845 mm). */
  gThreadDrum: partOf(DRUMS, 'euSteel'),
  /** NA HDPE drum with twin 2 in NPS bungs (870 mm): the one drum two-opening tapping can use. */
  twinBungDrum: partOf(DRUMS, 'naPlasticTwin'),
  /** 855 mm tube: fits twinBungDrum, bottoms out (4 mm too long) in fittingDrum. */
  twinBungTube: partOf(TUBES, 'n855'),
  /** Two-opening pumped station running twinBungDrum with a feed-only head. */
  twoOpeningStation: 'Tungsten CMP feed B',
  /** 790 mm legacy NPS-2 tube: too short for every NPS-2 drum; only a draft pairing. */
  shortTube: partOf(TUBES, 'n790'),
  /** Head with a 3/4 in (19.05 mm) feed and a separate 1/2 in (12.7 mm) restricted return, for two-opening tapping. */
  splitHead: partOf(HEADS, 'split'),
  /** Equal 3/4 + 3/4 in combined ceria head: the right head for the mechanically stirred ceria station. */
  ceriaCombinedHead: partOf(HEADS, 'combinedCeria'),
  /** Unkeyed head with 3/4 in feed and 5/8 in return (velocity ratio 1.44): a caution in one opening. */
  reducedReturnHead: partOf(HEADS, 'reducedReturn'),
  /** Legacy head with a 3/8 in return (ratio about 4.1, above the limit); its pairing is retired. */
  retiredHead: partOf(HEADS, 'legacyNarrow'),
  /** The retired pairing: fittingTube + retiredHead. */
  retiredPairing: { tube: partOf(TUBES, 'n836'), head: partOf(HEADS, 'legacyNarrow') },
  /** A draft pairing (approval caution): the 70x6 tube with the unkeyed combined head. */
  draftPairing: { tube: partOf(TUBES, 'b70x862'), head: partOf(HEADS, 'combinedUnkeyed') },
  /** Copper barrier slurry that foams: fails at the mechanically stirred station. */
  foamingSlurry: 'Hsinpu CuBar B7 barrier',
  /** Ceria slurry that is shear-sensitive. */
  shearSensitiveSlurry: 'Kumoyama CeriaFine 05',
  /** One-opening station with mechanical agitation and splitHead installed: tapping and ports fail. */
  oneOpeningStationWithSplitHead: 'Ceria STI feed C',
  /** The only mechanically agitated station (same as above). */
  mechanicalStation: 'Ceria STI feed C',
  /** One-opening station with reducedReturnHead: its usual combination is a caution. */
  cautionStation: 'Cu barrier feed D',
  /** At every station this set is in 'cleaning' and was used after its last rinse (rinse rule fails). */
  dirtyTubeSet: 'Set C',
  /** At every station this set is online and clean. */
  onlineTubeSet: 'Set A',
  /** Arrives in fittingDrum: 365-day shelf life, at least 90 days left on arrival (the expired and short-life cases). */
  shelfLifeSlurry: 'Mesa OxPlane 30 fumed silica',
  shelfLife: { days: 365, minRemainingDays: 90 },
  /** Needs its certificate of analysis at the dock; arrives in twinBungDrum, which fits at twoOpeningStation. */
  certificateSlurry: 'Mesa WPlane 18 tungsten',
  /** The collar key codes. */
  keyCodes: { oxide: 'LR-OCHRE', metal: 'LR-SLATE', ceria: 'LR-MOSS' },
} as const;

// ---------------------------------------------------------------------------------------------------

/** Inserts the demo registry. Thread specs must already be loaded; runs inside the caller's transaction. */
export async function seedDemoRegistry(m: EntityManager, people: { engineerId: string; engineer2Id: string; clerkId: string }): Promise<void> {
  const threadIds = new Map<string, string>();
  const thread = async (code: string): Promise<string> => {
    let id = threadIds.get(code);
    if (!id) {
      id = (await m.findOneByOrFail(ThreadSpec, { code })).id;
      threadIds.set(code, id);
    }
    return id;
  };

  const suppliers = new Map<SupplierRef, Supplier>();
  for (const s of SUPPLIERS) {
    const contactEmail = `${s.mailbox}@${s.ref.toLowerCase()}.example`;
    suppliers.set(s.ref, await m.save(m.create(Supplier, { name: s.name, region: s.region, contactEmail, notes: s.notes })));
  }
  const supplierId = (ref: SupplierRef): string => suppliers.get(ref)!.id;

  const keys = new Map<KeyRef, string>();
  for (const k of KEY_CODES) {
    keys.set(k.ref, (await m.save(m.create(KeyCode, { code: k.code, label: k.label, marking: k.marking }))).id);
  }
  const keyId = (ref: KeyRef | null): string | null => (ref === null ? null : keys.get(ref)!);

  const regionOf = new Map(SUPPLIERS.map((s) => [s.ref, s.region] as const));
  const drums = new Map<DrumRef, string>();
  for (const { ref, supplier, size, ...d } of DRUMS) {
    const [nominalCapacityL, outsideHeightMm, insideDepthMm, outsideDiameterMm, insideDiameterMm] = size;
    const drum = await m.save(
      m.create(DrumType, {
        ...d,
        supplierId: supplierId(supplier),
        region: regionOf.get(supplier)!,
        head: 'tight',
        unPackagingCode: TIGHT_HEAD_UN_CODE[d.material],
        nominalCapacityL,
        outsideHeightMm,
        insideDepthMm,
        outsideDiameterMm,
        insideDiameterMm,
      }),
    );
    drums.set(ref, drum.id);
    for (const { drum: _drum, thread: code, key, ...o } of OPENINGS.filter((o) => o.drum === ref)) {
      await m.save(m.create(DrumOpening, { ...o, drumTypeId: drum.id, threadSpecId: await thread(code), keyCodeId: keyId(key) }));
    }
  }

  const tubes = new Map<TubeRef, string>();
  for (const { ref, supplier, thread: code, key, ...t } of TUBES) {
    const tube = await m.save(m.create(DipTube, { ...t, supplierId: supplierId(supplier), threadSpecId: await thread(code), keyCodeId: keyId(key) }));
    tubes.set(ref, tube.id);
  }

  const heads = new Map<HeadRef, string>();
  for (const { ref, supplier, key, returnNominal, wornReturnBoreMm, ...h } of HEADS) {
    const returnBoreMm = wornReturnBoreMm ?? (returnNominal === null ? null : BORE_MM[returnNominal]);
    const head = await m.save(
      m.create(Connector, { ...h, supplierId: supplierId(supplier), keyCodeId: keyId(key), feedBoreMm: BORE_MM[HEAD_FEED], feedNominal: HEAD_FEED, returnBoreMm, returnNominal }),
    );
    heads.set(ref, head.id);
  }

  for (const p of PAIRINGS) {
    const reviewed = p.status !== 'draft';
    const pairing = await m.save(
      m.create(Pairing, {
        dipTubeId: tubes.get(p.tube)!,
        connectorId: heads.get(p.head)!,
        status: p.status,
        authorId: people.engineerId,
        approverId: reviewed ? people.engineer2Id : null,
        approvedAt: reviewed && p.approvedDaysAgo !== null ? daysAgo(p.approvedDaysAgo) : null,
        notes: p.notes,
      }),
    );
    if (reviewed && p.review) {
      await m.save(
        m.create(PairingReview, {
          pairingId: pairing.id,
          reviewerId: people.engineer2Id,
          decision: p.status === 'retired' ? 'retired' : 'approved',
          comment: p.review,
        }),
      );
    }
  }

  for (const { ref: _ref, supplier, drum, props, ...s } of SLURRIES) {
    await m.save(m.create(Slurry, { ...s, ...props, supplierId: supplierId(supplier), region: regionOf.get(supplier)!, drumTypeId: drums.get(drum)! }));
  }

  const rinserId = (r: Rinser): string => (r === 'clerk' ? people.clerkId : people.engineerId);
  for (const { head, usualDrum: _usualDrum, ...st } of STATIONS) {
    const station = await m.save(m.create(Station, { ...st, connectorId: heads.get(head)! }));
    for (const set of TUBE_SETS[st.name]) {
      await m.save(
        m.create(TubeSet, {
          stationId: station.id,
          label: set.label,
          dipTubeId: tubes.get(set.tube)!,
          state: set.state,
          lastRinsedAt: hoursAgo(set.rinsedHoursAgo),
          lastRinsedById: rinserId(set.rinsedBy),
          lastUsedAt: hoursAgo(set.usedHoursAgo),
        }),
      );
    }
  }
}
