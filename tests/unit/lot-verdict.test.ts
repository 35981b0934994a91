import { evaluateCandidate, type ConnectorInput, type DrumInput, type TubeInput } from '../../shared/fit';
import { composeLotVerdict, decideLot, holdReasonOf, noFitClause, type FitForVerdict } from '../../shared/dock';
import type { LotAcceptanceInput } from '../../shared/acceptance';

// The fit results come from the real fit rules, so the sentences are checked against what the rules say.
const head: ConnectorInput = { partNumber: 'HEAD-1', keyCode: null, feedBoreMm: 19.05, returnBoreMm: 19.05, returnPath: 'open', suitedTo: 'both' };
const tube = (partNumber: string, lengthMm: number, threadCode = 'G-2'): TubeInput => ({ partNumber, threadCode, lengthMm, keyCode: null, channels: 'feed-return' });

function fitOf(drum: DrumInput, tubes: TubeInput[], station: { name: string } | null = null): FitForVerdict {
  const candidates = tubes.map((t) => {
    const e = evaluateCandidate({ drum, tube: t, connector: head, pairing: { status: 'approved' } });
    return {
      dipTubePartNumber: t.partNumber!,
      connectorPartNumber: 'HEAD-1',
      dipTubeThreadCode: t.threadCode,
      dipTubeLengthMm: t.lengthMm,
      installedAtStation: !!station,
      verdict: e.verdict,
      rules: e.rules,
    };
  });
  const rank = { fits: 0, caution: 1, 'no-fit': 2 } as const;
  candidates.sort((a, b) => rank[a.verdict] - rank[b.verdict]);
  const verdict = candidates.length ? candidates[0].verdict : 'no-fit';
  return { verdict, drum, station, candidates };
}

// Site window 5 to 25 mm: an 818 mm drum takes tubes of 793 to 813 mm.
const shallow: DrumInput = {
  insideDepthMm: 818,
  openings: [
    { label: 'G 2 bung', threadCode: 'G-2', keyCode: null },
    { label: 'G 3/4 bung', threadCode: 'G-3/4', keyCode: null },
  ],
};
const TODAY = '2026-11-20';
const goodLot: LotAcceptanceInput = { today: TODAY, productionDate: null, expiryDate: '2027-06-01', temperatureIndicator: 'intact', certificateAttached: false, slurry: null };

describe('the lot verdict in plain words', () => {
  it('a lot that fits and passes says what to use and where', () => {
    const v = decideLot({ fit: fitOf(shallow, [tube('T-803', 803)], { name: 'Feed A' }), lot: goodLot });
    expect(v.decision).toBe('accept');
    expect(v.sentence).toBe('Use dip tube T-803 with head HEAD-1 at Feed A.');
    expect(v.blockers).toEqual([]);
  });

  it('with no station chosen, names the stations where the head is installed', () => {
    const v = decideLot({ fit: fitOf(shallow, [tube('T-803', 803)]), lot: goodLot, stationsWithHead: ['Feed A', 'Feed B'] });
    expect(v.sentence).toBe('Use dip tube T-803 with head HEAD-1 at Feed A or Feed B.');
  });

  it('says why across candidates: every G 2 tube too long, by how much the shortest misses, and the lengths to register', () => {
    const fit = fitOf(shallow, [tube('T-830', 830), tube('T-825', 825)]);
    expect(noFitClause(fit)).toBe('every G 2 tube on site is too long for this drum (the shortest by 12 mm); an engineer must register a tube of 793 to 813 mm');
    const v = decideLot({ fit, lot: goodLot });
    expect(v.decision).toBe('hold');
    expect(v.sentence).toMatch(/^Hold: every G 2 tube on site is too long/);
    expect(v.blockers[0]).toMatchObject({ source: 'fit', severity: 'hold', release: 'engineer', releasedBy: ['engineer', 'admin'] });
  });

  it('too short across candidates, and no thread at all', () => {
    expect(noFitClause(fitOf(shallow, [tube('T-780', 780), tube('T-770', 770)]))).toMatch(/too short for this drum \(the longest by 13 mm\)/);
    expect(noFitClause(fitOf(shallow, [tube('N-800', 800, 'NPS-2')]))).toMatch(/^no tube on site threads into this drum's G 2 and G 3\/4 openings/);
    expect(noFitClause({ verdict: 'no-fit', drum: shallow, station: null, candidates: [] })).toMatch(/no tube on site threads/);
  });

  it('largest blocker first: a frozen lot is quarantined even when it also fails on hardware and has expired', () => {
    const fit = fitOf(shallow, [tube('T-830', 830)]);
    const v = decideLot({ fit, lot: { ...goodLot, expiryDate: '2026-11-01', temperatureIndicator: 'froze' } });
    expect(v.decision).toBe('quarantine');
    expect(v.sentence).toBe('Quarantine: the temperature indicator shows the lot froze; an engineer must decide.');
    expect(v.blockers.map((b) => `${b.source}:${b.severity}`)).toEqual(['temperature:quarantine', 'shelf-life:hold', 'fit:hold']);
    expect(holdReasonOf(v)).toMatch(
      /froze.*expired on 1 Nov 2026.*Closest pairing, dip tube T-830 with head HEAD-1: the tube is too long and bottoms out: it is 12\.0 mm \(0\.47 in\) longer than the drum is deep/s,
    );
  });

  it('expired outranks a tripped indicator, which outranks hardware, which outranks a short life and a missing certificate', () => {
    const slurry = { shelfLifeDays: 365, minRemainingDays: 90, storageMinC: 5, storageMaxC: 30, certificateRequired: true };
    const fits = fitOf(shallow, [tube('T-803', 803)]);
    const noFit = fitOf(shallow, [tube('T-830', 830)]);
    const order = (fit: FitForVerdict, lot: Partial<LotAcceptanceInput>) => decideLot({ fit, lot: { ...goodLot, slurry, ...lot } }).blockers.map((b) => b.source);
    expect(order(noFit, { expiryDate: '2026-11-19', temperatureIndicator: 'tripped' })).toEqual(['shelf-life', 'temperature', 'fit', 'certificate']);
    expect(order(noFit, { expiryDate: '2026-12-01' })).toEqual(['fit', 'shelf-life', 'certificate']);
    const cert = decideLot({ fit: fits, lot: { ...goodLot, slurry } });
    expect(cert.decision).toBe('hold');
    expect(cert.sentence).toBe('Hold until the certificate of analysis is attached: this slurry needs it at the dock.');
    expect(cert.blockers[0]).toMatchObject({ release: 'certificate', releasedBy: ['clerk', 'engineer', 'admin'] });
    const attached = decideLot({ fit: fits, lot: { ...goodLot, slurry, certificateAttached: true } });
    expect(attached.decision).toBe('accept');
  });

  it('expired and tripped sentences name the date and the indicator', () => {
    const fits = fitOf(shallow, [tube('T-803', 803)]);
    expect(decideLot({ fit: fits, lot: { ...goodLot, expiryDate: '2026-11-19' } }).sentence).toBe('Hold: the lot expired on 19 Nov 2026; an engineer must decide.');
    expect(decideLot({ fit: fits, lot: { ...goodLot, temperatureIndicator: 'tripped' } }).sentence).toBe('Hold: the temperature indicator tripped; an engineer must decide.');
  });

  it('a caution keeps what to use first and says the caution after', () => {
    const fits = fitOf(shallow, [tube('T-803', 803)], { name: 'Feed A' });
    const v = composeLotVerdict({
      fit: fits,
      acceptance: { rules: [{ rule: 'shelf-life', outcome: 'caution', message: "The lot's remaining life is unknown: no production or expiry date was recorded." }], notChecked: [] },
      today: TODAY,
    });
    expect(v.decision).toBe('caution');
    expect(v.sentence).toBe("Caution: use dip tube T-803 with head HEAD-1 at Feed A, but the lot's remaining life is unknown: no production or expiry date was recorded.");
  });
});
