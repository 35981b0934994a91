import { CONNECTOR_SAYS, connectorProblem } from '../../shared/records/connector';
import { dipTubeProblem, DIP_TUBE_SAYS } from '../../shared/records/dip-tube';
import { drumTypeLabelOf, drumTypeProblem } from '../../shared/records/drum-type';
import { sentence } from '../../shared/records/field';
import { pairingEditProblem, PAIRING_SAYS } from '../../shared/records/pairing';
import { settingsProblem, SETTINGS_LIMITS, SETTINGS_SAYS } from '../../shared/records/settings';
import { SLURRY_LIMITS, SLURRY_SAYS, slurryProblem } from '../../shared/records/slurry';
import { tubeSetEditProblem, TUBE_SET_SAYS } from '../../shared/records/tube-set';

describe('drum type record', () => {
  it('wants the inside depth below the outside height, and names the field', () => {
    expect(drumTypeProblem({ insideDepthMm: 851, outsideHeightMm: 880 })).toBeNull();
    expect(drumTypeProblem({ insideDepthMm: 880, outsideHeightMm: 880 })).toEqual({ field: 'insideDepthMm', says: 'must be less than the outside height' });
    expect(drumTypeProblem({ insideDepthMm: 900, outsideHeightMm: 880 })?.field).toBe('insideDepthMm');
  });
  it('leaves a missing value to the field checks', () => {
    expect(drumTypeProblem({ insideDepthMm: 900 })).toBeNull();
    expect(drumTypeProblem({ insideDepthMm: null, outsideHeightMm: 880 })).toBeNull();
  });
  it('names nested fields as the form shows them', () => {
    expect(drumTypeLabelOf('openings.1.boreMm')).toBe('Opening 2 bore');
    expect(drumTypeLabelOf('insideDepthMm')).toBe('Inside depth');
  });
});

describe('dip tube record', () => {
  it('wants the bore below the outside diameter', () => {
    expect(dipTubeProblem({ boreMm: 19, odMm: 25.4 })).toBeNull();
    expect(dipTubeProblem({ boreMm: 25.4, odMm: 25.4 })).toEqual({ field: 'boreMm', says: DIP_TUBE_SAYS.boreMm });
    expect(sentence('Bore', DIP_TUBE_SAYS.boreMm)).toBe('Bore must be smaller than the outside diameter.');
  });
});

describe('dispense head (connector) record', () => {
  it('wants a return port bore exactly when the head has a return path', () => {
    expect(connectorProblem({ returnPath: 'open', returnBoreMm: 12.7 })).toBeNull();
    expect(connectorProblem({ returnPath: 'restricted', returnBoreMm: 0.1 })).toBeNull();
    expect(connectorProblem({ returnPath: 'none', returnBoreMm: null })).toBeNull();
    expect(connectorProblem({ returnPath: 'none', returnBoreMm: 12.7 })).toEqual({ field: 'returnBoreMm', says: 'must be empty when the head has no return path' });
    expect(connectorProblem({ returnPath: 'open', returnBoreMm: null })).toEqual({ field: 'returnBoreMm', says: 'is required when the head has a return path' });
    expect(connectorProblem({ returnPath: 'restricted' })?.says).toBe(CONNECTOR_SAYS.returnBoreWith);
  });
  it('leaves a missing return path to the field checks', () => {
    expect(connectorProblem({ returnPath: null, returnBoreMm: 12.7 })).toBeNull();
    expect(connectorProblem({})).toBeNull();
  });
  it('reads as a sentence in the form', () => {
    expect(sentence('Return port bore', CONNECTOR_SAYS.returnBoreWith)).toBe('Return port bore is required when the head has a return path.');
  });
});

describe('slurry record', () => {
  it('wants the remaining life asked for at most the shelf life (equal allowed)', () => {
    expect(slurryProblem({ shelfLifeDays: 365, minRemainingDays: 364 })).toBeNull();
    expect(slurryProblem({ shelfLifeDays: 365, minRemainingDays: 365 })).toBeNull();
    expect(slurryProblem({ shelfLifeDays: 365, minRemainingDays: 366 })).toEqual({ field: 'minRemainingDays', says: SLURRY_SAYS.minRemainingDays });
    expect(slurryProblem({ shelfLifeDays: 1, minRemainingDays: 0 })).toBeNull();
  });
  it('wants the highest storage temperature above the lowest (equal refused)', () => {
    expect(slurryProblem({ storageMinC: 5, storageMaxC: 5.1 })).toBeNull();
    expect(slurryProblem({ storageMinC: 5, storageMaxC: 5 })).toEqual({ field: 'storageMaxC', says: SLURRY_SAYS.storageMaxC });
    expect(slurryProblem({ storageMinC: 5, storageMaxC: -10 })?.field).toBe('storageMaxC');
    expect(slurryProblem({ storageMinC: -50, storageMaxC: -49.9 })).toBeNull();
  });
  it('leaves a missing value alone (every receiving field is optional)', () => {
    expect(slurryProblem({ shelfLifeDays: null, minRemainingDays: 400 })).toBeNull();
    expect(slurryProblem({ minRemainingDays: 400 })).toBeNull();
    expect(slurryProblem({ storageMinC: 5, storageMaxC: null })).toBeNull();
    expect(slurryProblem({})).toBeNull();
  });
  it('reports the remaining life before the storage range', () => {
    expect(slurryProblem({ shelfLifeDays: 10, minRemainingDays: 20, storageMinC: 5, storageMaxC: 5 })?.field).toBe('minRemainingDays');
  });
  it('keeps the table check bounds', () => {
    expect(SLURRY_LIMITS).toMatchObject({ solidsMinPct: 0, solidsMaxPct: 100, shelfLifeMinDays: 1, remainingMinDays: 0, daysMax: 3650, storageMinC: -50, storageMaxC: 80 });
  });
});

describe('pairing record', () => {
  it('lets an edit change the notes only, naming the part it tried to change', () => {
    expect(pairingEditProblem({})).toBeNull();
    const notesOnly: Record<string, unknown> = { notes: 'trial passed' };
    expect(pairingEditProblem(notesOnly)).toBeNull();
    expect(pairingEditProblem({ dipTubeId: 'a' })).toEqual({ field: 'dipTubeId', says: PAIRING_SAYS.fixedParts });
    expect(pairingEditProblem({ connectorId: 'b' })).toEqual({ field: 'connectorId', says: PAIRING_SAYS.fixedParts });
    expect(pairingEditProblem({ dipTubeId: 'a', connectorId: 'b' })?.field).toBe('dipTubeId');
    // A field sent as null is still a change (the DTO refuses it first).
    expect(pairingEditProblem({ connectorId: null })?.field).toBe('connectorId');
  });
});

describe('tube set record', () => {
  const existing = { state: 'in-use', stationId: 'st-1' };
  it('keeps its state for the rotation and its station for good', () => {
    expect(tubeSetEditProblem({}, existing)).toBeNull();
    expect(tubeSetEditProblem({ state: 'in-use', stationId: 'st-1' }, existing)).toBeNull();
    expect(tubeSetEditProblem({ state: 'cleaning' }, existing)).toEqual({ field: 'state', says: TUBE_SET_SAYS.state });
    expect(tubeSetEditProblem({ stationId: 'st-2' }, existing)).toEqual({ field: 'stationId', says: TUBE_SET_SAYS.stationId });
    expect(tubeSetEditProblem({ state: 'cleaning', stationId: 'st-2' }, existing)?.field).toBe('state');
  });
});

describe('site settings record', () => {
  it('wants the maximum tip clearance above the minimum (equal refused)', () => {
    expect(settingsProblem({ tipClearanceMinMm: 5, tipClearanceMaxMm: 5.1 })).toBeNull();
    expect(settingsProblem({ tipClearanceMinMm: 5, tipClearanceMaxMm: 5 })).toEqual({ field: 'tipClearanceMaxMm', says: SETTINGS_SAYS.tipClearanceMaxMm });
    expect(settingsProblem({ tipClearanceMinMm: 20, tipClearanceMaxMm: 10 })?.field).toBe('tipClearanceMaxMm');
    expect(settingsProblem({ tipClearanceMinMm: 0, tipClearanceMaxMm: SETTINGS_LIMITS.tipClearanceMaxFromMm })).toBeNull();
  });
  it('wants a time zone the runtime knows, checked only when one is given, before the clearances', () => {
    expect(settingsProblem({ timeZone: 'Europe/Berlin', tipClearanceMinMm: 5, tipClearanceMaxMm: 20 })).toBeNull();
    expect(settingsProblem({ timeZone: 'Mars/Olympus', tipClearanceMinMm: 5, tipClearanceMaxMm: 20 })).toEqual({ field: 'timeZone', says: SETTINGS_SAYS.timeZone });
    expect(settingsProblem({ timeZone: '', tipClearanceMinMm: 5, tipClearanceMaxMm: 5 })?.field).toBe('timeZone');
    expect(settingsProblem({ tipClearanceMinMm: 5, tipClearanceMaxMm: 20 })).toBeNull();
  });
});
