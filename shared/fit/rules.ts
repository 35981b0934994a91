// The fit rules, one function each. A rule whose input is missing (no station, no slurry, no tube set)
// returns a RuleNotChecked instead of a pass, so a missing input can never turn into a "fits".

import { computePortFlow, DEFAULT_LAMINAR_LIMIT, velocityRatio } from '../flow';
import { recommendDipTubeLength, validateClearanceWindow } from '../recommend-length';
import { threadSpecEquals } from '../threads/identify';
import { findThreadSpec } from '../threads/thread-table';
import { flowToM3s, formatLength, mmToIn } from '../units';
import { checkPassThrough } from './pass-through';
import type { CandidateInput, ConnectorInput, DrumInput, DrumOpening, FitSettings, RuleName, RuleNotChecked, RuleResult, TubeInput, TubeSetInput } from './types';

// Site settings until a site sets its own. Clearance 5 to 25 mm: at least 5 mm keeps the tip off the
// bottom chime and any dent, at most 25 mm keeps the undrawn heel small [practice]. Return velocity at
// most 4 times the feed velocity, i.e. a return bore no smaller than half the feed bore [practice].
// Laminar limit 2300, the most quoted of the published values. Thread tolerance as in identifyThread.
export const DEFAULT_SETTINGS: Readonly<FitSettings> = Object.freeze({
  tipClearanceMinMm: 5,
  tipClearanceMaxMm: 25,
  threadMatchToleranceMm: 0.6,
  laminarLimit: DEFAULT_LAMINAR_LIMIT,
  maxReturnVelocityRatio: 4,
});

/** Merges partial settings over the defaults and rejects values no site could mean. */
export function resolveSettings(partial: Partial<FitSettings> = {}): FitSettings {
  const s: FitSettings = { ...DEFAULT_SETTINGS, ...partial };
  validateClearanceWindow(s);
  if (!Number.isFinite(s.maxReturnVelocityRatio) || s.maxReturnVelocityRatio < 1) {
    throw new RangeError(`maxReturnVelocityRatio must be 1 or more, got ${s.maxReturnVelocityRatio}`);
  }
  if (!Number.isFinite(s.laminarLimit) || s.laminarLimit <= 0) {
    throw new RangeError(`laminarLimit must be a positive number, got ${s.laminarLimit}`);
  }
  if (!Number.isFinite(s.threadMatchToleranceMm) || s.threadMatchToleranceMm < 0) {
    throw new RangeError(`threadMatchToleranceMm must be zero or more, got ${s.threadMatchToleranceMm}`);
  }
  return s;
}

export type RuleCheck = RuleResult | RuleNotChecked;
export type RuleFn = (input: CandidateInput, settings: FitSettings) => RuleCheck;

export function isNotChecked(check: RuleCheck): check is RuleNotChecked {
  return !('outcome' in check);
}

const pass = (rule: RuleName, message: string, numbers?: Record<string, number>): RuleResult => (numbers ? { rule, outcome: 'pass', message, numbers } : { rule, outcome: 'pass', message });
const caution = (rule: RuleName, message: string, numbers?: Record<string, number>): RuleResult => (numbers ? { rule, outcome: 'caution', message, numbers } : { rule, outcome: 'caution', message });
const fail = (rule: RuleName, message: string, numbers?: Record<string, number>): RuleResult => (numbers ? { rule, outcome: 'fail', message, numbers } : { rule, outcome: 'fail', message });
const notChecked = (rule: RuleName, reason: string): RuleNotChecked => ({ rule, reason });

const round = (x: number, digits: number): number => Math.round(x * 10 ** digits) / 10 ** digits;

/** How a person would say the thread: 'G 2', '3/4 in NPT', or the raw code if it is not in the table. */
export function describeThread(code: string | null): string {
  if (code === null || code.trim() === '') return 'an unknown thread';
  return findThreadSpec(code)?.nominalLabel ?? code;
}

function openingName(opening: DrumOpening, index: number): string {
  return opening.label?.trim() || `opening ${index + 1}`;
}

/** Openings the tube screws into: same thread spec code (never the same nominal size). */
export function usableOpenings(drum: DrumInput, tube: Pick<TubeInput, 'threadCode'>): DrumOpening[] {
  return drum.openings.filter((o) => threadSpecEquals(o.threadCode, tube.threadCode));
}

/** The opening the tube goes into: a usable one whose key agrees with the tube if any, else the first usable. */
export function tubeOpening(drum: DrumInput, tube: Pick<TubeInput, 'threadCode' | 'keyCode'>): DrumOpening | undefined {
  const usable = usableOpenings(drum, tube);
  return usable.find((o) => o.keyCode !== null && o.keyCode === tube.keyCode) ?? usable[0];
}

function portLabel(boreMm: number, nominal?: string | null): string {
  const bore = formatLength(boreMm, 'mm', 2);
  return nominal ? `${nominal}, ${bore}` : bore;
}

// ---------------------------------------------------------------------------------------------------

export const checkThread: RuleFn = ({ drum, tube }) => {
  const opening = tubeOpening(drum, tube);
  const tubeThread = describeThread(tube.threadCode);
  if (opening) {
    const name = openingName(opening, drum.openings.indexOf(opening));
    return pass('thread', `The tube's ${tubeThread} thread matches the drum's ${name}.`);
  }
  if (drum.openings.length === 0) {
    return fail('thread', `The drum has no openings recorded, so the tube's ${tubeThread} thread cannot be matched.`);
  }
  const drumThreads = [...new Set(drum.openings.map((o) => describeThread(o.threadCode)))].join(' and ');
  return fail('thread', `The tube has a ${tubeThread} thread but the drum's openings are ${drumThreads}, so they do not screw together.`);
};

export const checkKey: RuleFn = ({ drum, tube, connector }) => {
  const opening = tubeOpening(drum, tube);
  const parts: Array<{ name: string; key: string | null }> = [
    ...(opening ? [{ name: `the drum's ${openingName(opening, drum.openings.indexOf(opening))}`, key: opening.keyCode }] : []),
    { name: 'the tube', key: tube.keyCode },
    { name: 'the head', key: connector.keyCode },
  ];
  const scope = opening ? '' : ' No opening takes this tube, so only the tube and head were compared.';
  const keyed = parts.filter((p) => p.key !== null);
  const keys = [...new Set(keyed.map((p) => p.key))];

  if (keys.length > 1) {
    const list = keyed.map((p) => `${p.name} is keyed ${p.key}`).join(', ');
    return fail('key', `The keys disagree: ${list}.${scope}`);
  }
  if (keyed.length === 0) {
    return pass('key', `No keying is in use on the drum, the tube or the head.${scope}`);
  }
  if (keyed.length < parts.length) {
    const unkeyed = parts
      .filter((p) => p.key === null)
      .map((p) => p.name)
      .join(' and ');
    return caution('key', `Keys agree where present (${keys[0]}), but ${unkeyed} ${parts.length - keyed.length > 1 ? 'are' : 'is'} not keyed, so keying cannot stop a wrong connection.${scope}`);
  }
  return pass('key', `The keys agree (${keys[0]}).${scope}`);
};

export const checkReach: RuleFn = ({ drum, tube }, settings) => {
  const window = recommendDipTubeLength({
    insideDepthMm: drum.insideDepthMm,
    tipClearanceMinMm: settings.tipClearanceMinMm,
    tipClearanceMaxMm: settings.tipClearanceMaxMm,
  });
  const gapMm = drum.insideDepthMm - tube.lengthMm;
  const numbers = {
    gapMm,
    gapIn: mmToIn(gapMm),
    minGapMm: settings.tipClearanceMinMm,
    maxGapMm: settings.tipClearanceMaxMm,
    minLengthMm: window.minLengthMm,
    maxLengthMm: window.maxLengthMm,
    targetLengthMm: window.targetMm,
  };
  const gapText = `${formatLength(Math.abs(gapMm), 'mm')} (${formatLength(Math.abs(gapMm), 'in', 2)})`;
  if (tube.lengthMm < window.minLengthMm) {
    return fail('reach', `The tube does not reach: its tip sits ${gapText} above the drum bottom (at most ${settings.tipClearanceMaxMm} mm allowed), leaving slurry undrawn.`, numbers);
  }
  if (tube.lengthMm > window.maxLengthMm) {
    const where = gapMm <= 0 ? `it is ${gapText} longer than the drum is deep` : `its tip would sit only ${gapText} above the drum bottom (at least ${settings.tipClearanceMinMm} mm needed)`;
    return fail('reach', `The tube is too long and bottoms out: ${where}.`, numbers);
  }
  return pass('reach', `The tip sits ${gapText} above the drum bottom, inside the ${settings.tipClearanceMinMm} to ${settings.tipClearanceMaxMm} mm window.`, numbers);
};

export const checkTapping: RuleFn = ({ connector, station, slurry }) => {
  if (!station) return notChecked('tapping', 'not checked: no station chosen');
  if (connector.suitedTo === 'both') {
    return pass('tapping', 'This head suits both one-opening and two-opening tapping.');
  }
  if (connector.suitedTo === station.tapping) {
    return pass('tapping', `This head is made for ${station.tapping} tapping, as the station uses.`);
  }
  if (connector.suitedTo === 'two-opening') {
    // [practice] A head built for a separate return opening routes its return through small openings.
    const sensitive = slurry?.shearSensitive ? ' This slurry is shear-sensitive.' : '';
    return fail(
      'tapping',
      `This head is made for two-opening tapping: used in one opening, its return runs through small openings, so slurry sprays back at high velocity and is sheared.${sensitive}`,
    );
  }
  return fail('tapping', 'This head is made for one-opening tapping and does not suit this station, which returns through a second opening.');
};

function portNumbers(connector: ConnectorInput, flowLpm: number | undefined, settings: FitSettings): Record<string, number> {
  const numbers: Record<string, number> = { feedBoreMm: connector.feedBoreMm };
  if (connector.returnBoreMm === null) return numbers;
  numbers.returnBoreMm = connector.returnBoreMm;
  numbers.velocityRatio = velocityRatio(connector.feedBoreMm, connector.returnBoreMm);
  if (flowLpm !== undefined && flowLpm > 0) {
    // Water properties stand in for the slurry: the velocities do not depend on them, Re only roughly.
    const flow = computePortFlow({
      flowM3s: flowToM3s(flowLpm, 'L/min'),
      feedBoreMm: connector.feedBoreMm,
      returnBoreMm: connector.returnBoreMm,
      laminarLimit: settings.laminarLimit,
    });
    numbers.flowLpm = flowLpm;
    numbers.feedVelocityMs = flow.feed.velocityMs;
    if (flow.return) {
      numbers.returnVelocityMs = flow.return.velocityMs;
      numbers.returnShearRatePerS = flow.return.shearRatePerS;
      numbers.returnReynolds = flow.return.reynolds;
    }
  }
  return numbers;
}

export const checkPorts: RuleFn = ({ connector, station }, settings) => {
  if (!station) return notChecked('ports', 'not checked: no station chosen');
  if (station.tapping === 'two-opening') {
    return pass('ports', "The return goes back through the other opening, so this head's return port does not carry it.");
  }
  const numbers = portNumbers(connector, station.flowLpm, settings);
  if (connector.returnPath === 'none' || connector.returnBoreMm === null) {
    return fail('ports', 'This head has no return port, but one-opening tapping returns the slurry through the head.', numbers);
  }
  if (connector.returnPath === 'restricted') {
    return fail('ports', "This head's return path is restricted, so in one opening the slurry would be forced back through it fast and sheared.", numbers);
  }
  const ratio = numbers.velocityRatio!;
  const feed = portLabel(connector.feedBoreMm, connector.feedNominal);
  const ret = portLabel(connector.returnBoreMm, connector.returnNominal);
  const atFlow = numbers.returnVelocityMs !== undefined ? ` (${round(numbers.returnVelocityMs, 2)} m/s at ${round(numbers.flowLpm!, 1)} L/min)` : '';
  // Equal bores give exactly 1; the epsilon only absorbs rounding of recorded bores.
  if (ratio <= 1 + 1e-9) {
    return pass('ports', `The return port (${ret}) is at least as large as the feed port (${feed}), so slurry returns no faster than it is drawn${atFlow}.`, numbers);
  }
  const times = `${round(ratio, 2)} times`;
  if (ratio > settings.maxReturnVelocityRatio) {
    return fail(
      'ports',
      `The return port (${ret}) is much smaller than the feed port (${feed}): slurry returns ${times} faster than it is drawn${atFlow}, above the site limit of ${settings.maxReturnVelocityRatio} times.`,
      numbers,
    );
  }
  return caution('ports', `The return port (${ret}) is smaller than the feed port (${feed}): slurry returns ${times} faster than it is drawn${atFlow}, which shears it.`, numbers);
};

export const checkFoam: RuleFn = ({ station, slurry }) => {
  if (!station) return notChecked('foam', 'not checked: no station chosen');
  if (!slurry) return notChecked('foam', 'not checked: no slurry chosen');
  if (!slurry.foams) return pass('foam', `This slurry does not foam, so ${station.agitation} agitation is fine.`);
  if (station.agitation === 'mechanical') {
    // [practice] A stirrer through one opening with the head in the other works, but not for a foaming slurry.
    return fail('foam', 'This slurry foams, so it must not be stirred by a mechanical agitator; recirculate it by pump instead.');
  }
  return pass('foam', 'This slurry foams and the station recirculates it by pump, not by stirring.');
};

export const checkOpenings: RuleFn = ({ drum, tube, station }) => {
  if (!station) return notChecked('openings', 'not checked: no station chosen');
  const needed = station.tapping === 'two-opening' ? 2 : 1;
  const usable = usableOpenings(drum, tube).length;
  const numbers = { usableOpenings: usable, neededOpenings: needed };
  const thread = describeThread(tube.threadCode);
  if (usable >= needed) {
    return pass(
      'openings',
      `The drum has ${usable} opening${usable === 1 ? '' : 's'} that take${usable === 1 ? 's' : ''} the tube's ${thread} thread; ${station.tapping} tapping needs ${needed}.`,
      numbers,
    );
  }
  return fail(
    'openings',
    `${station.tapping === 'two-opening' ? 'Two-opening' : 'One-opening'} tapping needs ${needed} opening${needed === 1 ? '' : 's'} that take the tube's ${thread} thread, but this drum has ${usable}.`,
    numbers,
  );
};

export const checkApproval: RuleFn = ({ pairing }) => {
  // No record and a draft record read the same to the clerk: not approved yet, never a pass.
  if (!pairing) return caution('approval', 'There is no pairing record for this tube and head, so it is not approved for use yet.');
  switch (pairing.status) {
    case 'approved':
      return pass('approval', 'This tube and head pairing is approved for use.');
    case 'retired':
      return fail('approval', 'This tube and head pairing is retired and must not be used.');
    case 'draft':
      return caution('approval', 'This tube and head pairing is not approved for use yet.');
  }
  // A status from outside the type (e.g. an old database value) is treated as not usable.
  return fail('approval', 'This tube and head pairing has a status that is not known, so it cannot be used.');
};

/** Milliseconds since the epoch, null for no date, NaN for a date that cannot be read. */
function toTime(value: Date | string | null): number | null {
  if (value === null) return null;
  return (value instanceof Date ? value : new Date(value)).getTime();
}

/**
 * Whether a tube set may go into the next drum. The one home of the rinse rule: the fit check uses it
 * through checkRinse, the station rotation uses it to refuse a dirty set.
 */
export function rinseCheck(tubeSet: TubeSetInput): RuleResult {
  const rinsed = toTime(tubeSet.lastRinsedAt);
  const used = toTime(tubeSet.lastUsedAt);
  if ((rinsed !== null && Number.isNaN(rinsed)) || (used !== null && Number.isNaN(used))) {
    return fail('rinse', "The tube set's rinse or use date cannot be read, so it cannot be cleared for the next drum.");
  }
  if (used === null) {
    // [practice] New wetted parts are flushed with deionised water before their first drum too.
    return rinsed === null
      ? caution('rinse', 'This tube set has not been used and has no rinse recorded; rinse it with deionised water before its first drum.')
      : pass('rinse', 'This tube set has been rinsed and not used since.');
  }
  if (rinsed === null || rinsed < used) {
    return fail('rinse', 'This tube set has not been rinsed since its last drum, so it cannot go into the next one: dried slurry flakes off and raises large-particle counts.');
  }
  return pass('rinse', 'This tube set was rinsed after its last drum.');
}

export const checkRinse: RuleFn = ({ tubeSet }) => (tubeSet ? rinseCheck(tubeSet) : notChecked('rinse', 'not checked: no tube set chosen'));

/** Every rule, in the order results are listed. */
export const FIT_RULES: ReadonlyArray<{ name: RuleName; check: RuleFn }> = [
  { name: 'thread', check: checkThread },
  { name: 'key', check: checkKey },
  { name: 'reach', check: checkReach },
  { name: 'pass-through', check: (input, settings) => checkPassThrough(input, settings) },
  { name: 'tapping', check: checkTapping },
  { name: 'ports', check: checkPorts },
  { name: 'foam', check: checkFoam },
  { name: 'openings', check: checkOpenings },
  { name: 'approval', check: checkApproval },
  { name: 'rinse', check: checkRinse },
];
