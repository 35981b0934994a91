import { evaluateCandidate, FIT_RULE_LABELS, FIT_RULES, RULE_NAMES, type CandidateInput, type DrumInput, type RuleResult } from '../../shared/fit';
import { checkTightHeadOpenings, TIGHT_HEAD_MAX_OPENING_MM } from '../../shared/fit/tight-head';
import { DEFAULT_SETTINGS } from '../../shared/fit/rules';

// UN Model Regulations 6.1.4.1.5 (steel drums; from memory): a tight-head drum's filling and emptying openings
// are at most 7.0 cm in diameter.
const LIMIT_MM = 70;

const drum = (head: DrumInput['head'], bores: Array<number | null>): DrumInput => ({
  insideDepthMm: 851,
  head,
  openings: bores.map((boreMm, i) => ({ label: `bung ${i + 1}`, threadCode: 'NPS-2', keyCode: null, boreMm })),
});
const judge = (d: DrumInput) => checkTightHeadOpenings({ drum: d } as CandidateInput, DEFAULT_SETTINGS);

describe('the tight-head opening rule', () => {
  it('holds the published limit', () => {
    expect(TIGHT_HEAD_MAX_OPENING_MM).toBe(LIMIT_MM);
  });

  it('passes a tight-head drum whose widest opening is 7.0 cm, the limit itself', () => {
    const r = judge(drum('tight', [19, LIMIT_MM])) as RuleResult;
    expect(r.outcome).toBe('pass');
    expect(r.numbers).toEqual({ widestBoreMm: 70, maxBoreMm: 70 });
    expect(r.message).toContain('bung 2');
  });

  it('cautions a tight-head drum with an opening just over 7.0 cm, naming the opening and both numbers', () => {
    const r = judge(drum('tight', [50, 70.5, null])) as RuleResult;
    expect(r).toMatchObject({ rule: 'tight-head', outcome: 'caution', numbers: { widestBoreMm: 70.5, maxBoreMm: 70 } });
    expect(r.message).toMatch(/bung 2 is 70\.5 mm across, wider than the 70\.0 mm/);
    expect(r.message).toContain('6.1.4.1.5');
  });

  it('does not apply to an open-head drum, whatever its openings', () => {
    expect((judge(drum('open', [400])) as RuleResult).outcome).toBe('pass');
  });

  it('is not checked when the head type or every bore is missing (a drum described at the dock)', () => {
    expect(judge(drum(null, [50]))).toEqual({ rule: 'tight-head', reason: "not checked: the drum's head type is not recorded" });
    expect(judge(drum(undefined, [50]))).toHaveProperty('reason');
    expect(judge(drum('tight', [null, null]))).toEqual({ rule: 'tight-head', reason: 'not checked: no opening has its bore recorded' });
  });

  it('turns an otherwise fitting candidate into a caution', () => {
    const candidate: CandidateInput = {
      drum: drum('tight', [50, 19]),
      tube: { threadCode: 'NPS-2', lengthMm: 836, keyCode: null, channels: 'feed-return' },
      connector: { keyCode: null, feedBoreMm: 19, returnBoreMm: 19, returnPath: 'open', suitedTo: 'both' },
      pairing: { status: 'approved' },
    };
    const fits = evaluateCandidate(candidate);
    expect(fits.rules.find((r) => r.rule === 'tight-head')?.outcome).toBe('pass');
    const key = fits.rules.find((r) => r.rule === 'key');
    expect(key?.outcome).toBe('pass');
    expect(fits.verdict).toBe('fits');
    const wide = evaluateCandidate({ ...candidate, drum: drum('tight', [75, 19]) });
    expect(wide.verdict).toBe('caution');
    expect(wide.rules.at(-1)).toMatchObject({ rule: 'tight-head', outcome: 'caution' });
  });
});

describe('the rule registry', () => {
  it('lists every rule once, in RULE_NAMES order, each with a label and a function', () => {
    expect(FIT_RULES.map((r) => r.name)).toEqual([...RULE_NAMES]);
    expect(new Set(RULE_NAMES).size).toBe(RULE_NAMES.length);
    for (const r of FIT_RULES) {
      expect(FIT_RULE_LABELS[r.name]).toMatch(/\S/);
      expect(typeof r.check).toBe('function');
    }
    expect(FIT_RULES.find((r) => r.name === 'tight-head')).toMatchObject({ label: 'Tight-head openings', judgesDrum: true });
  });
});
