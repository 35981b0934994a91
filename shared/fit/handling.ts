// The chemical-handling cautions shown beside a check. Kept as data in one place so the server's
// report and the client's preview show the same words [practice].

import type { HandlingCaution } from './types';

export interface HandlingContext {
  /** Someone will open a drum, insert or pull a tube, or touch wetted parts. */
  handlesSlurry?: boolean;
  /** A pumped (pressurised) line is connected or disconnected. */
  pressurised?: boolean;
}

const PPE: HandlingCaution = { topic: 'ppe', message: "Wear the site's PPE for slurry work: chemical gloves and goggles." };
const SDS: HandlingCaution = { topic: 'sds', message: "Follow the slurry's safety data sheet." };
const SPILLS: HandlingCaution = { topic: 'spills', message: 'Contain spills and keep slurry out of drains.' };
const PRESSURE: HandlingCaution = {
  topic: 'pressure',
  message: 'Never open a pressurised line: stop the pump and relieve the pressure before removing a head.',
};
const CODES: HandlingCaution = {
  topic: 'codes',
  message: "Local codes and the site's licensed engineering practice take precedence over this check.",
};

/** Cautions for a check that involves handling or pressure; none when it involves neither. */
export function handlingCautions(context: HandlingContext): HandlingCaution[] {
  const list: HandlingCaution[] = [];
  if (context.handlesSlurry) list.push(PPE, SDS, SPILLS);
  if (context.pressurised) list.push(PRESSURE);
  if (list.length > 0) list.push(CODES);
  // Copies, so a caller that edits its list cannot change what the next caller sees.
  return list.map((c) => ({ ...c }));
}
