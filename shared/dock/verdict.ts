// The lot's one verdict in plain words: the hardware fit (shared/fit) and the lot acceptance rules
// (shared/acceptance) folded into one decision and one sentence a clerk can act on, largest blocker first.
import type { AcceptanceEvaluation, AcceptanceResult, AcceptanceRuleName, LotAcceptanceInput, ReleasePath } from '../acceptance/types';
import { evaluateAcceptance } from '../acceptance/rules';
import { describeThread } from '../fit/rules';
import { ENGINEER_ROLES, type Role } from '../contract/roles';
import type { LotDecision, RuleOutcome, Verdict } from '../contract/verdicts';

export { LOT_DECISIONS, type LotDecision } from '../contract/verdicts';

/** The parts of a fit-check answer the verdict reads (POST /api/fit-checks; stored with each dock check). */
export interface FitForVerdict {
  verdict: Verdict;
  drum: { insideDepthMm: number; openings: Array<{ threadCode: string | null }> };
  station: { name?: string } | null;
  candidates: Array<{
    dipTubePartNumber: string;
    connectorPartNumber: string;
    dipTubeThreadCode?: string | null;
    dipTubeLengthMm?: number | null;
    installedAtStation: boolean;
    verdict: Verdict;
    rules: Array<{ rule: string; outcome: RuleOutcome; message: string; numbers?: Record<string, number> }>;
  }>;
}

export interface Blocker {
  /** 'fit' for the hardware, else the acceptance rule. */
  source: 'fit' | AcceptanceRuleName;
  severity: 'quarantine' | 'hold' | 'caution';
  /** The full reason, as the rule says it. */
  reason: string;
  /** For a hold or quarantine: how it is lifted and by whom. */
  release?: ReleasePath;
  releasedBy?: readonly Role[];
}

export interface LotVerdict {
  decision: LotDecision;
  /** One sentence, the largest blocker's (or what to use when nothing blocks). */
  sentence: string;
  /** Largest first. */
  blockers: Blocker[];
  acceptance: AcceptanceEvaluation;
  /** The site's date the lot was judged on. */
  today: string;
}

// Largest blocker first: what cannot be undone, then what an engineer must judge, then what the dock fixes.
const RANK: Record<string, number> = { temperature_quarantine: 0, 'shelf-life_expired': 1, temperature_hold: 2, fit_hold: 3, 'shelf-life_hold': 4, certificate_hold: 5, fit_caution: 6 };
const rankOf = (key: string) => RANK[key] ?? 7;

const stripStop = (s: string) => s.replace(/[.\s]+$/, '');
const lowerFirst = (s: string) => s.charAt(0).toLowerCase() + s.slice(1);

function useClause(fit: FitForVerdict, stationsWithHead: readonly string[]): string {
  const best = fit.candidates[0];
  const pair = `dip tube ${best.dipTubePartNumber} with head ${best.connectorPartNumber}`;
  if (fit.station?.name) return `Use ${pair} at ${fit.station.name}${best.installedAtStation ? '' : ' (fit that head there first)'}`;
  if (stationsWithHead.length) return `Use ${pair} at ${stationsWithHead.join(' or ')}`;
  return `Use ${pair}; no station has that head installed yet`;
}

/** Why nothing fits, said across every candidate, and what an engineer must do about it. */
export function noFitClause(fit: FitForVerdict): string {
  const threads = [...new Set(fit.drum.openings.map((o) => describeThread(o.threadCode)))].join(' and ');
  const threaded = fit.candidates.filter((c) => c.rules.find((r) => r.rule === 'thread')?.outcome === 'pass');
  if (!threaded.length) return `no tube on site threads into this drum's ${threads} openings; an engineer must register hardware for this drum design`;
  const reach = threaded.map((c) => c.rules.find((r) => r.rule === 'reach'));
  if (reach.every((r) => r?.outcome === 'fail' && r.numbers)) {
    const n = reach.map((r) => r!.numbers!);
    const lengths = threaded.map((c, i) => c.dipTubeLengthMm ?? fit.drum.insideDepthMm - n[i].gapMm);
    const lo = Math.round(n[0].minLengthMm);
    const hi = Math.round(n[0].maxLengthMm);
    const tubeThreads = [...new Set(threaded.map((c) => c.dipTubeThreadCode).filter(Boolean))];
    const which = tubeThreads.length === 1 ? `every ${describeThread(tubeThreads[0] as string)} tube` : 'every tube';
    const fix = `an engineer must register a tube of ${lo} to ${hi} mm`;
    const over = lengths.map((len, i) => len - n[i].maxLengthMm);
    const under = lengths.map((len, i) => n[i].minLengthMm - len);
    if (over.every((x) => x > 0)) return `${which} on site is too long for this drum (the shortest by ${Math.round(Math.min(...over))} mm); ${fix}`;
    if (under.every((x) => x > 0)) return `${which} on site is too short for this drum (the longest by ${Math.round(Math.min(...under))} mm); ${fix}`;
    return `no tube on site reaches the right depth in this drum; ${fix}`;
  }
  const best = fit.candidates[0];
  const fail = best.rules.find((r) => r.outcome === 'fail');
  const at = fit.station?.name ? ` at ${fit.station.name}` : '';
  return `no tube and head on site fits this drum${at}: ${lowerFirst(stripStop(fail?.message ?? 'every pairing fails a rule'))}; an engineer must decide`;
}

function acceptanceBlocker(r: AcceptanceResult): Blocker {
  if (r.outcome === 'caution') return { source: r.rule, severity: 'caution', reason: r.message };
  return { source: r.rule, severity: r.action ?? 'hold', reason: r.message, release: r.release ?? 'engineer', releasedBy: r.releasedBy ?? ENGINEER_ROLES };
}

function keyOf(b: Blocker, r?: AcceptanceResult): string {
  if (b.source === 'shelf-life' && b.severity === 'hold' && (r?.numbers?.remainingDays ?? 0) < 0) return 'shelf-life_expired';
  return `${b.source}_${b.severity}`;
}

function holdSentence(top: { blocker: Blocker; result?: AcceptanceResult }, fit: FitForVerdict): string {
  const { blocker, result } = top;
  if (blocker.source === 'fit') return `Hold: ${noFitClause(fit)}.`;
  if (blocker.source === 'certificate') return 'Hold until the certificate of analysis is attached: this slurry needs it at the dock.';
  const word = blocker.severity === 'quarantine' ? 'Quarantine' : 'Hold';
  return `${word}: ${result?.headline ?? stripStop(lowerFirst(blocker.reason))}; an engineer must decide.`;
}

/** Folds the fit answer and the acceptance results into one decision and sentence. Pure. */
export function composeLotVerdict(args: { fit: FitForVerdict; acceptance: AcceptanceEvaluation; today: string; stationsWithHead?: readonly string[] }): LotVerdict {
  const { fit, acceptance, today } = args;
  const items: Array<{ blocker: Blocker; result?: AcceptanceResult; rank: number }> = [];
  const best = fit.candidates[0];
  if (fit.verdict === 'no-fit') {
    // The sentence says why across candidates; the reason gives the closest pairing's own words.
    const fail = best?.rules.find((r) => r.outcome === 'fail');
    const reason =
      best && fail
        ? `Closest pairing, dip tube ${best.dipTubePartNumber} with head ${best.connectorPartNumber}: ${lowerFirst(fail.message)}`
        : `No registered tube and head pairing threads into this drum's openings.`;
    items.push({ blocker: { source: 'fit', severity: 'hold', reason, release: 'engineer', releasedBy: ENGINEER_ROLES }, rank: rankOf('fit_hold') });
  } else if (fit.verdict === 'caution' && best) {
    const c = best.rules.find((r) => r.outcome !== 'pass');
    items.push({ blocker: { source: 'fit', severity: 'caution', reason: c?.message ?? 'This pairing fits only with caution.' }, rank: rankOf('fit_caution') });
  }
  for (const r of acceptance.rules) {
    if (r.outcome === 'pass') continue;
    const blocker = acceptanceBlocker(r);
    items.push({ blocker, result: r, rank: rankOf(keyOf(blocker, r)) });
  }
  items.sort((a, b) => a.rank - b.rank);
  const blockers = items.map((i) => i.blocker);
  const top = items[0];
  const decision: LotDecision = !top ? 'accept' : top.blocker.severity === 'caution' ? 'caution' : top.blocker.severity;
  let sentence: string;
  if (!top) sentence = `${useClause(fit, args.stationsWithHead ?? [])}.`;
  else if (decision === 'caution') sentence = `Caution: ${lowerFirst(useClause(fit, args.stationsWithHead ?? []))}, but ${lowerFirst(stripStop(top.blocker.reason))}.`;
  else sentence = holdSentence(top, fit);
  return { decision, sentence, blockers, acceptance, today };
}

/** The server's (and the phone's) one call: every acceptance rule, then the combined verdict. */
export function decideLot(args: { fit: FitForVerdict; lot: LotAcceptanceInput; stationsWithHead?: readonly string[] }): LotVerdict {
  return composeLotVerdict({ fit: args.fit, acceptance: evaluateAcceptance(args.lot), today: args.lot.today, stationsWithHead: args.stationsWithHead });
}

/** The hold reason recorded with an automatic hold: every holding rule's reason, largest first. */
export function holdReasonOf(verdict: LotVerdict): string {
  return verdict.blockers
    .filter((b) => b.severity !== 'caution')
    .map((b) => b.reason)
    .join(' ');
}
