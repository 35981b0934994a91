// The lot acceptance rules, one pure function each, tagged like shared/fit/rules.ts: [practice] is common
// practice of the trade, [pub] a published source. A rule whose input is missing says "not checked" and
// never turns into a pass.
import { DOCK_ROLES, ENGINEER_ROLES } from '../contract/roles';
import { addDays, daysBetween, dayNumber, formatDay, type IsoDate } from '../dates';
import type { AcceptanceEvaluation, AcceptanceNotChecked, AcceptanceResult, LotAcceptanceInput } from './types';

type Check = AcceptanceResult | AcceptanceNotChecked;
export const isAcceptanceNotChecked = (c: Check): c is AcceptanceNotChecked => !('outcome' in c);

const plural = (n: number, word: string) => `${n} ${word}${n === 1 ? '' : 's'}`;

function rangeText(slurry: LotAcceptanceInput['slurry']): string | null {
  if (!slurry || slurry.storageMinC === null || slurry.storageMaxC === null) return null;
  return `${slurry.storageMinC} to ${slurry.storageMaxC} °C`;
}

/** The lot's expiry: the label's expiry date, else production date + the slurry's shelf life, else null. */
export function lotExpiry(input: Pick<LotAcceptanceInput, 'productionDate' | 'expiryDate' | 'slurry'>): { date: IsoDate; from: 'label' | 'shelf-life' } | null {
  if (input.expiryDate) return { date: input.expiryDate, from: 'label' };
  const shelf = input.slurry?.shelfLifeDays ?? null;
  if (input.productionDate && shelf !== null) return { date: addDays(input.productionDate, shelf), from: 'shelf-life' };
  return null;
}

/**
 * Expired, or too close to expiry to be used up: hold [practice]. The expiry date is the last day the lot
 * may be used, so a lot expiring today has 0 days left: not expired, but below any minimum above 0.
 */
export function checkShelfLife(input: LotAcceptanceInput): Check {
  const expiry = lotExpiry(input);
  const shelf = input.slurry?.shelfLifeDays ?? null;
  const minimum = input.slurry?.minRemainingDays ?? 0;
  if (!expiry) {
    const registered = shelf !== null || (input.slurry?.minRemainingDays ?? null) !== null;
    if (!registered && !input.productionDate) return { rule: 'shelf-life', reason: 'not checked: no dates recorded and no shelf life registered for the slurry' };
    const why = input.productionDate ? 'the label gives a production date but no shelf life is registered for this slurry' : 'no production or expiry date was recorded';
    return { rule: 'shelf-life', outcome: 'caution', message: `The lot's remaining life is unknown: ${why}. Read the expiry date from the drum label or the certificate.` };
  }
  const left = daysBetween(input.today, expiry.date);
  const when = formatDay(expiry.date);
  const source = expiry.from === 'label' ? 'by its label' : `from its production date and the ${shelf}-day shelf life`;
  const numbers = { remainingDays: left, minRemainingDays: minimum, ...(shelf !== null ? { shelfLifeDays: shelf } : {}) };
  const engineer = { action: 'hold' as const, release: 'engineer' as const, releasedBy: ENGINEER_ROLES };
  if (left < 0) {
    return {
      rule: 'shelf-life',
      outcome: 'fail',
      ...engineer,
      numbers,
      headline: `the lot expired on ${when}`,
      message: `The lot expired on ${when} (${source}), ${plural(-left, 'day')} ago: expired slurry is not used.`,
    };
  }
  if (left < minimum) {
    return {
      rule: 'shelf-life',
      outcome: 'fail',
      ...engineer,
      numbers,
      headline: `the lot expires on ${when}, ${plural(left, 'day')} from now, below the ${minimum} days it must have on arrival`,
      message: `The lot expires on ${when} (${source}): ${plural(left, 'day')} left, below the ${minimum} days this slurry must have on arrival, so it may not be used up in time.`,
    };
  }
  const need = minimum > 0 ? ` (at least ${minimum} needed)` : '';
  return { rule: 'shelf-life', outcome: 'pass', numbers, message: `The lot expires on ${when} (${source}): ${plural(left, 'day')} left${need}.` };
}

/**
 * The temperature indicator on the drums. Frozen colloidal abrasive flocculates and does not recover on
 * thawing: quarantine [practice; silica-sol makers' handling notes]. A tripped indicator means the lot left
 * its storage range in transit: hold until an engineer has looked at it [practice].
 */
export function checkTemperature(input: LotAcceptanceInput): Check {
  const range = rangeText(input.slurry);
  const within = range ? ` its ${range} storage range` : ' its storage range';
  switch (input.temperatureIndicator) {
    case null:
      return { rule: 'temperature', reason: 'not checked: the temperature indicator was not recorded' };
    case 'froze':
      return {
        rule: 'temperature',
        outcome: 'fail',
        action: 'quarantine',
        release: 'engineer',
        releasedBy: ENGINEER_ROLES,
        headline: 'the temperature indicator shows the lot froze',
        message: 'The temperature indicator shows the lot froze: frozen slurry flocculates and does not recover on thawing. Keep the drums apart, unopened.',
      };
    case 'tripped':
      return engineerHold('the temperature indicator tripped', `The temperature indicator tripped: the lot left${within} in transit, so an engineer must check it before use.`);
    case 'intact':
      return { rule: 'temperature', outcome: 'pass', message: `The temperature indicator is intact: the lot stayed within${within}.` };
    case 'not-fitted':
      // Many lots ship without one; its absence is said, not held [practice].
      return { rule: 'temperature', outcome: 'pass', message: `No temperature indicator was fitted; look for frost or settled, separated slurry before use${range ? ` (storage ${range})` : ''}.` };
  }
  return engineerHold('the temperature indicator reading is not known', 'The temperature indicator reading is not one Bungwise knows, so an engineer must check the lot.');
}

/** A temperature reading that holds the lot until an engineer has looked at it. */
function engineerHold(headline: string, message: string): Check {
  return { rule: 'temperature', outcome: 'fail', action: 'hold', release: 'engineer', releasedBy: ENGINEER_ROLES, headline, message };
}

/** A slurry that needs its certificate of analysis at the dock is held until the certificate is attached [practice]. */
export function checkCertificate(input: LotAcceptanceInput): Check {
  if (!input.slurry) return { rule: 'certificate', reason: 'not checked: no slurry chosen' };
  if (!input.slurry.certificateRequired) {
    return {
      rule: 'certificate',
      outcome: 'pass',
      message: input.certificateAttached ? 'The certificate of analysis is attached (this slurry does not require one).' : 'This slurry needs no certificate of analysis at the dock.',
    };
  }
  if (input.certificateAttached) return { rule: 'certificate', outcome: 'pass', message: 'The certificate of analysis is attached.' };
  return {
    rule: 'certificate',
    outcome: 'fail',
    action: 'hold',
    release: 'certificate',
    releasedBy: DOCK_ROLES,
    headline: 'the certificate of analysis is missing',
    message: 'This slurry needs its certificate of analysis at the dock and none is attached: attaching it lifts this hold.',
  };
}

export const ACCEPTANCE_RULES = [checkShelfLife, checkTemperature, checkCertificate] as const;

/** Every acceptance rule on one lot. */
export function evaluateAcceptance(input: LotAcceptanceInput): AcceptanceEvaluation {
  const out: AcceptanceEvaluation = { rules: [], notChecked: [] };
  for (const rule of ACCEPTANCE_RULES) {
    const c = rule(input);
    if (isAcceptanceNotChecked(c)) out.notChecked.push(c);
    else out.rules.push(c);
  }
  return out;
}

/** Dates a clerk cannot mean, by field: the server refuses them (400) and the dock form says so first. */
export function lotDateProblems(input: Pick<LotAcceptanceInput, 'today' | 'productionDate' | 'expiryDate'>): Record<string, string> {
  const problems: Record<string, string> = {};
  const p = input.productionDate;
  const e = input.expiryDate;
  if (p !== null && dayNumber(p) === null) problems.productionDate = 'must be a date, YYYY-MM-DD';
  else if (p !== null && daysBetween(input.today, p) > 0) problems.productionDate = `must not be after today (${formatDay(input.today)}): check the label`;
  if (e !== null && dayNumber(e) === null) problems.expiryDate = 'must be a date, YYYY-MM-DD';
  else if (e !== null && p !== null && !problems.productionDate && daysBetween(p, e) < 0) problems.expiryDate = 'must not be before the production date: check the label';
  return problems;
}
