import { judgeMaterial, judgeWettedParts, materialsNamed, WETTED_MATERIALS, type SlurryChemistry } from '../../shared/wetted-materials';

// Silica slurries are alkaline, about pH 9 to 11 [pub, secondary: REFERENCES.md "Slurry handling facts"]
const silica: SlurryChemistry = { phMin: 9, phMax: 11, oxidiser: 'none', solventWtPct: 0 };
const peroxide: SlurryChemistry = { phMin: 2, phMax: 4, oxidiser: 'strong', solventWtPct: 0 };

describe('wetted materials [practice]', () => {
  it('covers the common wetted materials the trade uses', () => {
    for (const m of ['PFA', 'PTFE', 'PVDF', 'HDPE', 'PP', '316L', 'EPDM', 'FKM']) expect(WETTED_MATERIALS).toContain(m);
  });

  it('fluoropolymers resist everything in the table', () => {
    for (const m of ['PFA', 'PTFE', 'FFKM']) {
      for (const chem of [silica, peroxide, { phMin: 0, phMax: 14, oxidiser: 'strong' as const, solventWtPct: 50 }]) expect(judgeMaterial(m, chem).compatibility).toBe('resists');
    }
  });

  it('PVDF is attacked by strong bases and limited near pH 12', () => {
    expect(judgeMaterial('PVDF', { ...silica, phMax: 12.5 })).toEqual({ material: 'PVDF', compatibility: 'attacked', because: ['PVDF is attacked above pH 12; the slurry reaches pH 12.5'] });
    expect(judgeMaterial('PVDF', silica).compatibility).toBe('resists');
    expect(judgeMaterial('PVDF', { ...silica, phMax: 11.5 }).compatibility).toBe('limited');
  });

  it('polyolefins are attacked by a strong oxidiser; FKM by a strong base', () => {
    expect(judgeMaterial('HDPE', peroxide).compatibility).toBe('attacked');
    expect(judgeMaterial('pp', peroxide).because).toEqual(['PP is attacked by a strong oxidiser']);
    expect(judgeMaterial('FKM', { ...silica, phMax: 12 }).compatibility).toBe('attacked');
    expect(judgeMaterial('FKM', silica).compatibility).toBe('limited');
    expect(judgeMaterial('EPDM', { ...silica, solventWtPct: 5 }).compatibility).toBe('attacked');
    expect(judgeMaterial('316L', { ...peroxide, phMin: 1.5 }).compatibility).toBe('attacked');
  });

  it('a material not in the table is unknown, not a pass', () => {
    expect(judgeMaterial('Viton-like blend', silica)).toEqual({ material: 'Viton-like blend', compatibility: null, because: ['Viton-like blend is not in the wetted-materials table'] });
  });
});

describe('parts with several wetted materials', () => {
  it('reads a free-text list, FFKM not read as FKM', () => {
    expect(materialsNamed('PFA, PTFE, FFKM seals')).toEqual({ known: ['PFA', 'PTFE', 'FFKM'], unknown: [] });
    expect(materialsNamed('PVDF body / 316L spring and EPDM o-rings')).toEqual({ known: ['PVDF', '316L', 'EPDM'], unknown: [] });
    expect(materialsNamed('PFA, glass')).toEqual({ known: ['PFA'], unknown: ['glass'] });
  });

  it('the worst material decides; an unknown one leaves it unknown unless another is attacked', () => {
    expect(judgeWettedParts('PFA, PTFE, FFKM seals', peroxide).worst).toBe('resists');
    expect(judgeWettedParts('PFA, PTFE, EPDM seals', peroxide).worst).toBe('attacked');
    expect(judgeWettedParts('PFA, glass', silica).worst).toBeNull();
    expect(judgeWettedParts('HDPE, glass', peroxide).worst).toBe('attacked');
    expect(judgeWettedParts('', silica).worst).toBeNull();
  });
});
