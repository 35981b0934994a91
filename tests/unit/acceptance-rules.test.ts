import {
  addDays,
  checkCertificate,
  checkShelfLife,
  checkTemperature,
  daysBetween,
  evaluateAcceptance,
  formatDay,
  isIsoDate,
  localDate,
  lotDateProblems,
  lotExpiry,
  type LotAcceptanceInput,
  type SlurryAcceptance,
} from '../../shared/acceptance';
import { DOCK_ROLES, ENGINEER_ROLES } from '../../shared/contract/roles';

// Fixed dates: "today" is an input, never the clock.
const TODAY = '2026-11-20';
const slurry = (over: Partial<SlurryAcceptance> = {}): SlurryAcceptance => ({ shelfLifeDays: 365, minRemainingDays: 90, storageMinC: 5, storageMaxC: 30, certificateRequired: false, ...over });
const lot = (over: Partial<LotAcceptanceInput> = {}): LotAcceptanceInput => ({
  today: TODAY,
  productionDate: null,
  expiryDate: null,
  temperatureIndicator: 'intact',
  certificateAttached: false,
  slurry: slurry(),
  ...over,
});
const outcome = (c: ReturnType<typeof checkShelfLife>) => ('outcome' in c ? c.outcome : 'not-checked');

describe('calendar dates', () => {
  it('reads only real calendar dates', () => {
    expect(isIsoDate('2028-02-29')).toBe(true);
    expect(isIsoDate('2026-02-29')).toBe(false);
    expect(isIsoDate('2026-2-3')).toBe(false);
    expect(addDays('2026-12-31', 1)).toBe('2027-01-01');
    expect(daysBetween('2026-11-20', '2026-11-19')).toBe(-1);
    expect(formatDay('2026-11-02')).toBe('2 Nov 2026');
  });

  it("today is the site's local date: the same instant is a different day east and west of UTC", () => {
    const instant = new Date('2026-11-20T23:30:00Z');
    expect(localDate(instant, 'UTC')).toBe('2026-11-20');
    expect(localDate(instant, 'Asia/Tokyo')).toBe('2026-11-21');
    expect(localDate(new Date('2026-11-20T03:00:00Z'), 'America/Los_Angeles')).toBe('2026-11-19');
  });
});

describe('shelf life [practice]', () => {
  it('takes the expiry from the label first, else production date + shelf life', () => {
    expect(lotExpiry({ productionDate: '2026-01-01', expiryDate: '2026-12-01', slurry: slurry() })).toEqual({ date: '2026-12-01', from: 'label' });
    expect(lotExpiry({ productionDate: '2026-01-01', expiryDate: null, slurry: slurry({ shelfLifeDays: 365 }) })).toEqual({ date: '2027-01-01', from: 'shelf-life' });
    expect(lotExpiry({ productionDate: '2026-01-01', expiryDate: null, slurry: slurry({ shelfLifeDays: null }) })).toBeNull();
  });

  it('a lot that expired yesterday is held for an engineer', () => {
    const r = checkShelfLife(lot({ expiryDate: '2026-11-19' }));
    expect(r).toMatchObject({ outcome: 'fail', action: 'hold', release: 'engineer', releasedBy: ENGINEER_ROLES, numbers: { remainingDays: -1 } });
    expect('message' in r && r.message).toMatch(/expired on 19 Nov 2026.*1 day ago/);
  });

  it('a lot expiring today has 0 days left: not expired, but held when any minimum applies', () => {
    const withMinimum = checkShelfLife(lot({ expiryDate: TODAY }));
    expect(withMinimum).toMatchObject({ outcome: 'fail', numbers: { remainingDays: 0, minRemainingDays: 90 } });
    expect('message' in withMinimum && withMinimum.message).not.toMatch(/expired/);
    expect(outcome(checkShelfLife(lot({ expiryDate: TODAY, slurry: slurry({ minRemainingDays: null }) })))).toBe('pass');
  });

  it('remaining life exactly the minimum passes; one day less holds', () => {
    expect(outcome(checkShelfLife(lot({ expiryDate: addDays(TODAY, 90) })))).toBe('pass');
    const short = checkShelfLife(lot({ expiryDate: addDays(TODAY, 89) }));
    expect(short).toMatchObject({ outcome: 'fail', action: 'hold', numbers: { remainingDays: 89 } });
    expect('headline' in short && short.headline).toMatch(/89 days from now, below the 90 days/);
  });

  it('production date + shelf life: 276 days ago with a 365-day life leaves 89 days, below 90', () => {
    const r = checkShelfLife(lot({ productionDate: addDays(TODAY, -276) }));
    expect(r).toMatchObject({ outcome: 'fail', numbers: { remainingDays: 89, shelfLifeDays: 365 } });
    expect(outcome(checkShelfLife(lot({ productionDate: addDays(TODAY, -275) })))).toBe('pass');
  });

  it('missing dates: a caution when the slurry has a shelf life, not checked when nothing is known', () => {
    expect(outcome(checkShelfLife(lot()))).toBe('caution');
    expect(outcome(checkShelfLife(lot({ productionDate: '2026-10-01', slurry: slurry({ shelfLifeDays: null }) })))).toBe('caution');
    expect(outcome(checkShelfLife(lot({ slurry: null })))).toBe('not-checked');
    // Without a slurry the label's expiry still counts, with no minimum.
    expect(outcome(checkShelfLife(lot({ slurry: null, expiryDate: '2026-11-01' })))).toBe('fail');
  });
});

describe('temperature indicator [practice]', () => {
  it('froze: quarantine for an engineer; tripped: hold for an engineer; intact and none fitted pass; unrecorded is not checked', () => {
    expect(checkTemperature(lot({ temperatureIndicator: 'froze' }))).toMatchObject({ outcome: 'fail', action: 'quarantine', releasedBy: ENGINEER_ROLES });
    const tripped = checkTemperature(lot({ temperatureIndicator: 'tripped' }));
    expect(tripped).toMatchObject({ outcome: 'fail', action: 'hold', release: 'engineer' });
    expect('message' in tripped && tripped.message).toContain('5 to 30 °C');
    expect(checkTemperature(lot({ temperatureIndicator: 'intact' }))).toMatchObject({ outcome: 'pass' });
    expect(checkTemperature(lot({ temperatureIndicator: 'not-fitted' }))).toMatchObject({ outcome: 'pass' });
    expect(checkTemperature(lot({ temperatureIndicator: null }))).toEqual({ rule: 'temperature', reason: expect.stringMatching(/^not checked/) });
  });
});

describe('certificate of analysis [practice]', () => {
  it('required and missing holds until attached (the dock can lift it); attached or not required passes', () => {
    expect(checkCertificate(lot({ slurry: slurry({ certificateRequired: true }) }))).toMatchObject({ outcome: 'fail', action: 'hold', release: 'certificate', releasedBy: DOCK_ROLES });
    expect(checkCertificate(lot({ slurry: slurry({ certificateRequired: true }), certificateAttached: true }))).toMatchObject({ outcome: 'pass' });
    expect(checkCertificate(lot())).toMatchObject({ outcome: 'pass' });
    expect(checkCertificate(lot({ slurry: null }))).toMatchObject({ reason: 'not checked: no slurry chosen' });
  });

  it('evaluates every rule, listing those not checked apart', () => {
    const e = evaluateAcceptance(lot({ slurry: null, temperatureIndicator: null }));
    expect(e.rules).toEqual([]);
    expect(e.notChecked.map((n) => n.rule)).toEqual(['shelf-life', 'temperature', 'certificate']);
  });
});

describe('dates a clerk cannot mean', () => {
  it('names the field: a production date after today, an expiry before production, a date that does not exist', () => {
    expect(lotDateProblems({ today: TODAY, productionDate: '2026-11-21', expiryDate: null })).toEqual({ productionDate: expect.stringMatching(/after today/) });
    expect(lotDateProblems({ today: TODAY, productionDate: '2026-10-01', expiryDate: '2026-09-30' })).toEqual({ expiryDate: expect.stringMatching(/before the production date/) });
    expect(lotDateProblems({ today: TODAY, productionDate: '2026-02-30', expiryDate: null })).toEqual({ productionDate: expect.stringMatching(/YYYY-MM-DD/) });
    expect(lotDateProblems({ today: TODAY, productionDate: TODAY, expiryDate: TODAY })).toEqual({});
  });
});
