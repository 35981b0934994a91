import { checkPassThrough, threadMinorDiameterMm } from '../../shared/fit/pass-through';
import { DEFAULT_SETTINGS, evaluateCandidate, type CandidateInput, type RuleResult } from '../../shared/fit';
import { findThreadSpec } from '../../shared/threads/thread-table';

const IN = 25.4; // NIST SP 811: 1 in = 25.4 mm exactly [pub]

function input(tubeOdMm: number | null, boreMm: number | null, threadCode = 'G-2'): CandidateInput {
  return {
    drum: { insideDepthMm: 851, openings: [{ label: 'large bung', threadCode, keyCode: null, boreMm }] },
    tube: { threadCode, lengthMm: 836, keyCode: null, channels: 'feed', odMm: tubeOdMm },
    connector: { keyCode: null, feedBoreMm: 20, returnBoreMm: null, returnPath: 'none', suitedTo: 'both' },
  };
}
const run = (i: CandidateInput) => checkPassThrough(i, DEFAULT_SETTINGS);

describe('threadMinorDiameterMm', () => {
  it('G 2 and G 3/4: major minus 1.280654 P', () => {
    // ISO 228-1: G 2 major 59.614 mm, pitch 2.309 mm [pub]; minor 56.656 mm [mem: ISO 228-1 table]
    expect(threadMinorDiameterMm(findThreadSpec('G-2')!)).toBeCloseTo(56.656, 2);
    // ISO 228-1: G 3/4 major 26.441 mm, pitch 1.814 mm [pub]; minor 24.117 mm [mem: ISO 228-1 table]
    expect(threadMinorDiameterMm(findThreadSpec('G-3/4')!)).toBeCloseTo(24.117, 2);
  });

  it('2 in NPT: OD minus 1.6 P at the large end', () => {
    // ASME B1.20.1: OD 2.375 in, 11.5 TPI, h = 0.800 P [pub]; 2.375 - 1.6/11.5 = 2.2359 in [derived]
    expect(threadMinorDiameterMm(findThreadSpec('NPT-2')!)! / IN).toBeCloseTo(2.2359, 4);
  });

  it('knows no minor diameter for a buttress bung', () => {
    expect(threadMinorDiameterMm(findThreadSpec('BT-56x4')!)).toBeNull();
  });
});

describe('pass-through rule', () => {
  it('refuses a tube wider than the bore, naming both numbers', () => {
    const r = run(input(52, 50)) as RuleResult;
    expect(r.outcome).toBe('fail');
    expect(r.message).toMatch(/52\.0 mm .*bore, 50\.0 mm/);
    expect(r.numbers).toMatchObject({ tubeOdMm: 52, passageMm: 50 });
  });

  it('uses the thread minor diameter when it is smaller than the recorded bore', () => {
    // G 2 minor 56.66 mm (ISO 228-1 [pub] dimensions, h = 0.640327 P [mem]) against a recorded 58 mm bore
    const r = run(input(57, 58)) as RuleResult;
    expect(r.outcome).toBe('fail');
    expect(r.message).toMatch(/minor diameter of its G 2 thread, 56\.7 mm/);
    const ok = run(input(42, 58)) as RuleResult;
    expect(ok.outcome).toBe('pass');
  });

  it('cautions under 1 mm to spare [practice]', () => {
    expect((run(input(49.5, 50)) as RuleResult).outcome).toBe('caution');
    expect((run(input(48.9, 50)) as RuleResult).outcome).toBe('pass');
  });

  it('is not checked without the tube OD, or with neither bore nor a known thread form', () => {
    expect(run(input(null, 50))).toMatchObject({ rule: 'pass-through', reason: expect.stringMatching(/outside diameter/) });
    expect(run(input(40, null, 'BT-56x4'))).toMatchObject({ reason: expect.stringMatching(/neither/) });
  });

  it('decides the candidate verdict through the rule list', () => {
    const e = evaluateCandidate(input(52, 50));
    expect(e.verdict).toBe('no-fit');
    expect(e.rules.find((r) => r.rule === 'pass-through')?.outcome).toBe('fail');
  });
});
