import { drumClock, recirculationMinutes, standbyReadiness, turnovers } from '../../shared/drum-life';

describe('recirculation', () => {
  it('a 200 L drum at 20 L/min turns over once every 10 min', () => {
    // REFERENCES.md "Recirculation" [derived]: N = Q t / V; 200 L at 20 L/min, once every 10 min
    expect(turnovers(20, 10, 200)).toBeCloseTo(1, 12);
    expect(turnovers(20, 35, 200)).toBeCloseTo(3.5, 12);
    expect(recirculationMinutes({ minTurnovers: 1 }, 20, 200)).toBeCloseTo(10, 12);
  });

  it('the longer of turnovers and minutes wins; none asks for nothing', () => {
    expect(recirculationMinutes({ minTurnovers: 3, minMinutes: 20 }, 20, 200)).toBeCloseTo(30, 12);
    expect(recirculationMinutes({ minTurnovers: 1, minMinutes: 45 }, 20, 200)).toBeCloseTo(45, 12);
    expect(recirculationMinutes({}, 20, 200)).toBe(0);
  });

  it('refuses a flow or volume that is not positive, naming it', () => {
    expect(() => turnovers(0, 10, 200)).toThrow(/flowLpm/);
    expect(() => recirculationMinutes({ minTurnovers: 1 }, 20, -1)).toThrow(/volumeL/);
    expect(() => turnovers(20, -1, 200)).toThrow(/minutes/);
  });
});

describe('drum clock', () => {
  const onlineAt = new Date('2026-12-04T10:12:00Z');
  // 571.5 mm inside diameter, tip 10 mm off the bottom: heel about 2.57 L [derived, REFERENCES.md "Drum geometry at the bottom"]
  const clock = drumClock({ onlineAt, fillL: 200, insideDiameterMm: 571.5, tipClearanceMm: 10, flowLpm: 20, need: { minTurnovers: 3 } });

  it('is ready to feed after its recirculation: 3 turnovers of 200 L at 20 L/min is 30 min', () => {
    expect(clock.recirculationMinutes).toBeCloseTo(30, 12);
    expect(clock.readyAt).toBe('2026-12-04T10:42:00.000Z');
  });

  it('runs dry after drawing what the tip can reach', () => {
    expect(clock.heelL).toBeCloseTo(2.57, 2);
    expect(clock.usableL).toBeCloseTo(200 - 2.565, 2);
    // 197.43 L at 20 L/min = 9.87 min of draw after the ready time
    expect(Date.parse(clock.runsDryAt!) - Date.parse(clock.readyAt)).toBeCloseTo((clock.usableL / 20) * 60_000, 0);
  });

  it('a standby needing 30 min must start by 30 min before the online drum runs dry', () => {
    const dry = Date.parse(clock.runsDryAt!);
    const early = standbyReadiness(clock, 30, new Date(dry - 45 * 60_000));
    expect(early).toEqual({ status: 'ready-in-time', startBy: new Date(dry - 30 * 60_000).toISOString() });
    const late = standbyReadiness(clock, 30, new Date(dry - 20 * 60_000));
    expect(late.status).toBe('late');
    if (late.status === 'late') expect(late.shortMinutes).toBeCloseTo(10, 9);
    expect(standbyReadiness({ runsDryAt: null }, 30, new Date())).toEqual({ status: 'unknown' });
  });
});
