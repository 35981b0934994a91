import {
  checkApproval,
  checkFoam,
  checkKey,
  checkOpenings,
  checkPorts,
  checkReach,
  checkRinse,
  checkTapping,
  checkThread,
  DEFAULT_SETTINGS,
  drumVerdict,
  evaluateCandidate,
  handlingCautions,
  isNotChecked,
  resolveSettings,
  RULE_NAMES,
  type CandidateInput,
  type RuleCheck,
  type RuleFn,
  type RuleResult,
} from '../../shared/fit';
import { flowToM3s } from '../../shared/units';

const IN = 25.4; // NIST SP 811 Appendix B: 1 in = 25.4 mm exactly [pub]
// 55 US gal steel drum, inside about 33.5 in high [pub, secondary]
const DEPTH_55_GAL_MM = 851;

/** A candidate that passes every rule; each test changes one thing. */
function base(): CandidateInput {
  return {
    drum: {
      insideDepthMm: DEPTH_55_GAL_MM,
      // North American steel drums: 2 in and 3/4 in straight pipe thread bungs [pub, old 49 CFR drum text]
      openings: [
        { label: 'large bung', threadCode: 'NPS-2', keyCode: 'K1', boreMm: 50 },
        { label: 'small bung', threadCode: 'NPS-3/4', keyCode: null, boreMm: 19 },
      ],
      head: 'tight',
    },
    tube: { partNumber: 'DT-836', threadCode: 'NPS-2', lengthMm: DEPTH_55_GAL_MM - 15, keyCode: 'K1', channels: 'feed-return', odMm: 42 },
    connector: {
      partNumber: 'HD-1',
      keyCode: 'K1',
      feedBoreMm: 0.75 * IN,
      feedNominal: '3/4 in',
      returnBoreMm: 0.75 * IN,
      returnNominal: '3/4 in',
      returnPath: 'open',
      suitedTo: 'both',
    },
    station: { tapping: 'one-opening', agitation: 'pump', flowLpm: 20 },
    slurry: { foams: false, shearSensitive: false },
    pairing: { status: 'approved' },
    tubeSet: { lastUsedAt: '2026-03-01T08:00:00Z', lastRinsedAt: '2026-03-01T10:00:00Z' },
  };
}

function run(rule: RuleFn, input: CandidateInput): RuleResult {
  const result: RuleCheck = rule(input, resolveSettings(input.settings));
  if (isNotChecked(result)) throw new Error(`rule ${result.rule} was not checked: ${result.reason}`);
  return result;
}

/** The test that a rule passes the base candidate. */
const passesBase = (rule: RuleFn) => () => expect(run(rule, base()).outcome).toBe('pass');

function with_(patch: (c: CandidateInput) => void): CandidateInput {
  const c = base();
  patch(c);
  return c;
}

/** The rule's outcome, and what its message must say: a string it contains, or a pattern it matches. */
function expectOutcome(r: RuleResult, outcome: RuleResult['outcome'], says: Array<string | RegExp>): void {
  expect(r.outcome).toBe(outcome);
  for (const s of says)
    if (typeof s === 'string') expect(r.message).toContain(s);
    else expect(r.message).toMatch(s);
}

/** One rule on the base candidate with one thing changed. */
const runWith = (rule: RuleFn, patch: (c: CandidateInput) => void): RuleResult => run(rule, with_(patch));

describe('the base candidate', () => {
  it('passes every rule and fits', () => {
    const r = evaluateCandidate(base());
    expect(r.rules.map((x) => x.rule)).toEqual([...RULE_NAMES]);
    expect(r.rules.filter((x) => x.outcome !== 'pass')).toEqual([]);
    expect(r.notChecked).toEqual([]);
    expect(r.verdict).toBe('fits');
  });
});

describe('thread', () => {
  it('passes on the same spec code', passesBase(checkThread));

  it('fails on the same nominal size but a different spec, naming both', () => {
    // ISO 228-1 G 2 (11 TPI) vs ASME B1.20.1 2 in straight pipe thread (11.5 TPI) [pub]: same nominal, no match
    const r = runWith(checkThread, (c) => (c.tube.threadCode = 'G-2'));
    expectOutcome(r, 'fail', ['G 2', '2 in NPS']);
  });

  it('fails on a drum with no openings recorded', () => {
    expect(runWith(checkThread, (c) => (c.drum.openings = [])).outcome).toBe('fail');
  });
});

describe('key', () => {
  it('passes when all agree', () => {
    expect(run(checkKey, base())).toMatchObject({ outcome: 'pass', message: expect.stringContaining('K1') });
  });

  it('passes with a note when nothing is keyed', () => {
    const r = runWith(checkKey, (c) => {
      c.drum.openings[0]!.keyCode = null;
      c.tube.keyCode = null;
      c.connector.keyCode = null;
    });
    expect(r.outcome).toBe('pass');
    expect(r.message).toMatch(/No keying is in use/);
  });

  it('cautions a mix of keyed and unkeyed', () => {
    const r = runWith(checkKey, (c) => (c.connector.keyCode = null));
    expectOutcome(r, 'caution', [/the head is not keyed/]);
  });

  it('fails when keys disagree', () => {
    const r = runWith(checkKey, (c) => (c.connector.keyCode = 'K2'));
    expectOutcome(r, 'fail', ['K1', 'K2']);
  });
});

describe('reach', () => {
  it('passes inside the window and reports the gap in mm and in', () => {
    const r = run(checkReach, base());
    expect(r.outcome).toBe('pass');
    expect(r.numbers!.gapMm).toBeCloseTo(15, 9);
    expect(r.numbers!.gapIn).toBeCloseTo(15 / IN, 9);
    expect(r.numbers!.targetLengthMm).toBeCloseTo(DEPTH_55_GAL_MM - (5 + 25) / 2, 9);
  });

  it('passes at both edges of the window', () => {
    expect(runWith(checkReach, (c) => (c.tube.lengthMm = DEPTH_55_GAL_MM - 25)).outcome).toBe('pass');
    expect(runWith(checkReach, (c) => (c.tube.lengthMm = DEPTH_55_GAL_MM - 5)).outcome).toBe('pass');
  });

  it('fails a tube that does not reach', () => {
    const r = runWith(checkReach, (c) => (c.tube.lengthMm = DEPTH_55_GAL_MM - 25.5));
    expect(r.outcome).toBe('fail');
    expect(r.message).toMatch(/does not reach/);
    expect(r.message).toMatch(/undrawn/);
    expect(r.numbers!.gapMm).toBeCloseTo(25.5, 9);
  });

  it('fails a tube that bottoms out', () => {
    const close = runWith(checkReach, (c) => (c.tube.lengthMm = DEPTH_55_GAL_MM - 2));
    expect(close.outcome).toBe('fail');
    expect(close.message).toMatch(/bottoms out/);
    const through = runWith(checkReach, (c) => (c.tube.lengthMm = DEPTH_55_GAL_MM + 10));
    expect(through.outcome).toBe('fail');
    expect(through.numbers!.gapMm).toBeCloseTo(-10, 9);
    expect(through.message).toMatch(/longer than the drum is deep/);
  });

  it("uses the site's clearance window", () => {
    const input = with_((c) => (c.settings = { tipClearanceMinMm: 20, tipClearanceMaxMm: 40 }));
    expect(run(checkReach, input).outcome).toBe('fail'); // 15 mm gap is below a 20 mm minimum
  });
});

describe('tapping', () => {
  it('passes a head suited to both, or to the station tapping', () => {
    expect(run(checkTapping, base()).outcome).toBe('pass');
    expect(runWith(checkTapping, (c) => (c.connector.suitedTo = 'one-opening')).outcome).toBe('pass');
  });

  it('fails a two-opening-only head in one-opening tapping, giving the shear reason', () => {
    // common practice, no published source: its return runs through small openings, slurry sprays back and is sheared
    const r = runWith(checkTapping, (c) => (c.connector.suitedTo = 'two-opening'));
    expectOutcome(r, 'fail', [/sprays back at high velocity/, /sheared/]);
  });

  it('fails a one-opening-only head at a two-opening station', () => {
    const r = runWith(checkTapping, (c) => {
      c.connector.suitedTo = 'one-opening';
      c.station!.tapping = 'two-opening';
    });
    expect(r.outcome).toBe('fail');
  });

  it('is not checked without a station', () => {
    expect(
      checkTapping(
        with_((c) => (c.station = null)),
        DEFAULT_SETTINGS,
      ),
    ).toEqual({
      rule: 'tapping',
      reason: 'not checked: no station chosen',
    });
  });
});

describe('ports', () => {
  it('cautions a 3/4 in feed with a 1/2 in return in one-opening tapping, ratio 2.25', () => {
    // common practice, no published source: 3/4 in feed, 1/2 in return in one opening -> caution, (19.05/12.7)^2 = 2.25
    const r = runWith(checkPorts, (c) => {
      c.connector.returnBoreMm = 0.5 * IN;
      c.connector.returnNominal = '1/2 in';
    });
    expect(r.outcome).toBe('caution');
    expect(r.numbers!.velocityRatio).toBeCloseTo(2.25, 12);
    expect(r.message).toMatch(/2\.25 times faster/);
    // v = Q / A at the station's 20 L/min [pub formula]
    const q = flowToM3s(20, 'L/min');
    expect(r.numbers!.returnVelocityMs).toBeCloseTo(q / ((Math.PI * 0.0127 ** 2) / 4), 12);
    expect(r.numbers!.returnVelocityMs! / r.numbers!.feedVelocityMs!).toBeCloseTo(2.25, 12);
  });

  it('passes same-size ports with an open return path', () => {
    const r = run(checkPorts, base());
    expect(r.outcome).toBe('pass');
    expect(r.numbers!.velocityRatio).toBe(1);
  });

  it('fails a ratio beyond the site limit', () => {
    // (19.05 / 9)^2 = 4.48 > default limit 4
    const r = runWith(checkPorts, (c) => (c.connector.returnBoreMm = 9));
    expect(r.outcome).toBe('fail');
    expect(r.numbers!.velocityRatio).toBeCloseTo((19.05 / 9) ** 2, 12);
    const strict = with_((c) => {
      c.connector.returnBoreMm = 0.5 * IN;
      c.settings = { maxReturnVelocityRatio: 2 };
    });
    expect(run(checkPorts, strict).outcome).toBe('fail');
  });

  it('fails a restricted return path or no return in one-opening', () => {
    expect(runWith(checkPorts, (c) => (c.connector.returnPath = 'restricted')).outcome).toBe('fail');
    const none = with_((c) => {
      c.connector.returnPath = 'none';
      c.connector.returnBoreMm = null;
    });
    expect(run(checkPorts, none).outcome).toBe('fail');
  });

  it('passes in two-opening tapping, where the return uses the other opening', () => {
    const r = runWith(checkPorts, (c) => {
      c.station!.tapping = 'two-opening';
      c.connector.returnPath = 'restricted';
      c.connector.returnBoreMm = 6;
    });
    expect(r.outcome).toBe('pass');
  });

  it('leaves out velocities when no flow is known', () => {
    const r = runWith(checkPorts, (c) => delete c.station!.flowLpm);
    expect(r.numbers!.returnVelocityMs).toBeUndefined();
    expect(r.numbers!.velocityRatio).toBe(1);
  });
});

describe('foam', () => {
  it('fails a foaming slurry with mechanical agitation', () => {
    // common practice, no published source: mechanical agitation is not for a foaming slurry
    const r = runWith(checkFoam, (c) => {
      c.slurry!.foams = true;
      c.station!.agitation = 'mechanical';
    });
    expect(r.outcome).toBe('fail');
  });

  it('passes a foaming slurry recirculated by pump and a non-foaming one stirred', () => {
    expect(runWith(checkFoam, (c) => (c.slurry!.foams = true)).outcome).toBe('pass');
    expect(runWith(checkFoam, (c) => (c.station!.agitation = 'mechanical')).outcome).toBe('pass');
  });

  it('is not checked without a slurry', () => {
    expect(
      isNotChecked(
        checkFoam(
          with_((c) => (c.slurry = undefined)),
          DEFAULT_SETTINGS,
        ),
      ),
    ).toBe(true);
  });
});

describe('openings', () => {
  it('needs one usable opening for one-opening tapping', () => {
    const r = run(checkOpenings, base());
    expect(r.outcome).toBe('pass');
    expect(r.numbers).toEqual({ usableOpenings: 1, neededOpenings: 1 });
  });

  it('fails two-opening tapping on a drum with one usable opening', () => {
    const r = runWith(checkOpenings, (c) => (c.station!.tapping = 'two-opening'));
    expect(r.outcome).toBe('fail');
    expect(r.numbers).toEqual({ usableOpenings: 1, neededOpenings: 2 });
  });

  it('passes two-opening tapping on a drum with two matching openings', () => {
    // Plastic drums with two 56x4 buttress bungs [pub, no dimension standard found]
    const r = runWith(checkOpenings, (c) => {
      c.station!.tapping = 'two-opening';
      c.drum.openings = [
        { threadCode: 'BT-56x4', keyCode: null },
        { threadCode: 'BT-56x4', keyCode: null },
      ];
      c.tube.threadCode = 'BT-56x4';
    });
    expect(r.outcome).toBe('pass');
    expect(r.numbers!.usableOpenings).toBe(2);
  });
});

describe('approval', () => {
  it.each([
    [{ status: 'approved' as const }, 'pass'],
    [{ status: 'draft' as const }, 'caution'],
    [null, 'caution'],
    [undefined, 'caution'],
    [{ status: 'retired' as const }, 'fail'],
  ])('%p -> %s', (pairing, outcome) => {
    const r = runWith(checkApproval, (c) => (c.pairing = pairing));
    expect(r.outcome).toBe(outcome);
    if (outcome === 'caution') expect(r.message).toMatch(/not approved for use yet/);
  });

  it('makes a physically fitting but unapproved pair a caution, never fits', () => {
    const r = evaluateCandidate(with_((c) => (c.pairing = { status: 'draft' })));
    expect(r.rules.filter((x) => x.outcome !== 'pass').map((x) => x.rule)).toEqual(['approval']);
    expect(r.verdict).toBe('caution');
  });
});

describe('rinse', () => {
  it('passes a set rinsed after its last drum', passesBase(checkRinse));

  it('fails a set not rinsed since its last drum', () => {
    const r = runWith(checkRinse, (c) => (c.tubeSet = { lastUsedAt: new Date('2026-03-02T08:00:00Z'), lastRinsedAt: new Date('2026-03-01T10:00:00Z') }));
    expect(r.outcome).toBe('fail');
    expect(r.message).toMatch(/large-particle/);
    expect(runWith(checkRinse, (c) => (c.tubeSet = { lastUsedAt: '2026-03-01', lastRinsedAt: null })).outcome).toBe('fail');
  });

  it('cautions a new set with no rinse and fails an unreadable date', () => {
    expect(runWith(checkRinse, (c) => (c.tubeSet = { lastUsedAt: null, lastRinsedAt: null })).outcome).toBe('caution');
    expect(runWith(checkRinse, (c) => (c.tubeSet = { lastUsedAt: 'yesterday', lastRinsedAt: null })).outcome).toBe('fail');
  });

  it('is not checked without a tube set', () => {
    expect(
      checkRinse(
        with_((c) => (c.tubeSet = null)),
        DEFAULT_SETTINGS,
      ),
    ).toEqual({ rule: 'rinse', reason: 'not checked: no tube set chosen' });
  });
});

describe('verdicts', () => {
  it('is the worst rule', () => {
    const cautionOnly = evaluateCandidate(with_((c) => (c.connector.returnBoreMm = 0.5 * IN)));
    expect(cautionOnly.verdict).toBe('caution');
    const failAndCaution = evaluateCandidate(
      with_((c) => {
        c.connector.returnBoreMm = 0.5 * IN;
        c.tube.lengthMm = 700;
      }),
    );
    expect(failAndCaution.rules.map((x) => x.outcome)).toEqual(expect.arrayContaining(['caution', 'fail']));
    expect(failAndCaution.verdict).toBe('no-fit');
  });

  it('leaves out rules with no input and does not count them', () => {
    const r = evaluateCandidate(
      with_((c) => {
        c.station = undefined;
        c.tubeSet = undefined;
      }),
    );
    expect(r.notChecked.map((x) => x.rule)).toEqual(['tapping', 'ports', 'foam', 'openings', 'rinse']);
    expect(r.rules.map((x) => x.rule)).toEqual(['thread', 'key', 'reach', 'pass-through', 'approval', 'tight-head']);
    expect(r.verdict).toBe('fits');
  });

  it('gives a drum the best candidate verdict', () => {
    const fits = evaluateCandidate(base());
    const noFit = evaluateCandidate(with_((c) => (c.tube.threadCode = 'G-2')));
    const caution = evaluateCandidate(with_((c) => (c.pairing = null)));
    expect(noFit.verdict).toBe('no-fit');
    expect(drumVerdict([noFit, caution])).toBe('caution');
    expect(drumVerdict([noFit, caution, fits])).toBe('fits');
    expect(drumVerdict([noFit])).toBe('no-fit');
    expect(drumVerdict([])).toBe('no-fit');
    expect(drumVerdict(['caution', 'no-fit'])).toBe('caution');
  });
});

describe('settings', () => {
  it('has documented defaults', () => {
    expect(DEFAULT_SETTINGS).toEqual({
      tipClearanceMinMm: 5,
      tipClearanceMaxMm: 25,
      threadMatchToleranceMm: 0.6,
      laminarLimit: 2300,
      maxReturnVelocityRatio: 4,
    });
  });

  it('rejects settings no site could mean', () => {
    expect(() => resolveSettings({ tipClearanceMinMm: 30, tipClearanceMaxMm: 10 })).toThrow(RangeError);
    expect(() => resolveSettings({ maxReturnVelocityRatio: 0.5 })).toThrow(RangeError);
    expect(() => evaluateCandidate(with_((c) => (c.drum.insideDepthMm = 20)))).toThrow(RangeError);
  });
});

describe('handling cautions', () => {
  it('lists PPE, SDS, spills and codes for handling, and pressure for a pumped line', () => {
    const topics = evaluateCandidate(base()).handling.map((h) => h.topic);
    expect(topics).toEqual(['ppe', 'sds', 'spills', 'pressure', 'codes']);
    const noStation = evaluateCandidate(with_((c) => (c.station = null))).handling.map((h) => h.topic);
    expect(noStation).not.toContain('pressure');
    expect(handlingCautions({}).length).toBe(0);
    const pressure = handlingCautions({ pressurised: true });
    expect(pressure.map((h) => h.topic)).toEqual(['pressure', 'codes']);
    expect(pressure[0]!.message).toMatch(/relieve the pressure before removing a head/);
  });
});
