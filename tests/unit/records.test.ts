import { dipTubeProblem, DIP_TUBE_SAYS } from '../../shared/records/dip-tube';
import { drumTypeLabelOf, drumTypeProblem } from '../../shared/records/drum-type';
import { sentence } from '../../shared/records/field';

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
