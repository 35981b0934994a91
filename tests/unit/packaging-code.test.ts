import { checkDrumPackagingCode, parsePackagingCode, type ParsedPackagingCode } from '../../shared/packaging-code';

function parsed(code: string): ParsedPackagingCode {
  const r = parsePackagingCode(code);
  if (!r.ok) throw new Error(`expected ${code} to parse: ${r.error}`);
  return r;
}

describe('parsePackagingCode', () => {
  it.each([
    // UN Model Regulations 6.1.2 / 49 CFR 178.502: 1 drum, A steel, 1 non-removable head [pub]
    ['1A1', '1', 'drum', 'A', 'steel', '1', /tight head/],
    // UN Model Regulations 6.1.2 / 49 CFR 178.502: 1 drum, A steel, 2 removable head [pub]
    ['1A2', '1', 'drum', 'A', 'steel', '2', /open head/],
    // UN Model Regulations 6.1.2 / 49 CFR 178.502: 1 drum, H plastic, 1 non-removable head [pub]
    ['1H1', '1', 'drum', 'H', 'plastic', '1', /tight head/],
    // UN Model Regulations 6.1.2 / 49 CFR 178.502: 1 drum, H plastic, 2 removable head [pub]
    ['1H2', '1', 'drum', 'H', 'plastic', '2', /open head/],
    // UN Model Regulations 6.1.2 / 49 CFR 178.502: 3 jerrican, H plastic, 1 non-removable head [pub]
    ['3H1', '3', 'jerrican', 'H', 'plastic', '1', /tight head/],
  ])('%s', (code, kind, kindLabel, material, materialLabel, category, categoryPattern) => {
    const r = parsed(code);
    expect(r).toMatchObject({ code, group: 'single', kind, kindLabel, material, materialLabel, category });
    expect(r.categoryLabel).toMatch(categoryPattern);
    expect(r.explanation).toContain(`${materialLabel} ${kindLabel}`);
  });

  it('31HA1 is a composite IBC for liquids, plastic inner in steel, rigid inner', () => {
    // 49 CFR 178.702(b): 31 liquids, H plastic inner receptacle, A steel outer casing, 1 rigid inner [pub]
    const r = parsed('31HA1');
    expect(r).toMatchObject({ group: 'ibc', kind: '31', material: 'HA', category: '1' });
    expect(r.kindLabel).toMatch(/liquids/);
    expect(r.materialLabel).toMatch(/plastic inner receptacle in a steel outer casing/);
    expect(r.categoryLabel).toBe('rigid inner receptacle');
  });

  it('reads the code out of a full mark', () => {
    expect(parsed('un 1a1/Y1.4/150/24').code).toBe('1A1');
    expect(parsed('  1H2 ').code).toBe('1H2');
  });

  it('reads fibre drums without a head category', () => {
    // UN Model Regulations 6.1.2: 1G fibre drum, no category numeral [mem]
    expect(parsed('1G')).toMatchObject({ materialLabel: 'fibreboard', category: null, categoryLabel: null });
  });

  it.each([
    ['', /No packaging code/],
    ['A1', /not a packaging code/],
    ['8A1', /kind numeral 8/],
    ['1E1', /material letter E/],
    ['1A', /1 \(tight head\) or 2 \(open head\)/],
    ['1A3', /not 3/],
    ['1AA1', /two material letters/],
    ['1G1', /no category numeral/],
    ['31XA1', /material letter X/],
    ['31HA3', /rigid inner receptacle/],
    ['6H1', /two material letters/],
  ])('rejects %p with a reason', (code, reason) => {
    const r = parsePackagingCode(code);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error).toMatch(reason);
  });
});

describe('checkDrumPackagingCode', () => {
  const outcomes = (findings: ReturnType<typeof checkDrumPackagingCode>) => Object.fromEntries(findings.map((f) => [f.check, f.outcome]));

  it('passes a code that agrees with the drum record', () => {
    expect(outcomes(checkDrumPackagingCode({ code: '1A1', material: 'steel', head: 'tight' }))).toEqual({
      code: 'pass',
      kind: 'pass',
      material: 'pass',
      head: 'pass',
    });
    expect(outcomes(checkDrumPackagingCode({ code: '1H2', material: 'plastic', head: 'open' })).head).toBe('pass');
  });

  it('fails a steel code on a plastic drum', () => {
    // 49 CFR 178.502: A = steel, H = plastic [pub]
    const findings = checkDrumPackagingCode({ code: '1A2', material: 'plastic', head: 'open' });
    const material = findings.find((f) => f.check === 'material')!;
    expect(material.outcome).toBe('fail');
    expect(material.message).toMatch(/steel/);
    expect(material.message).toMatch(/plastic/);
  });

  it('fails an open-head code on a drum recorded as tight head', () => {
    // 49 CFR 178.502: category 2 = removable head [pub]
    const findings = checkDrumPackagingCode({ code: '1H2', material: 'plastic', head: 'tight' });
    const head = findings.find((f) => f.check === 'head')!;
    expect(head.outcome).toBe('fail');
    expect(head.message).toMatch(/open head/);
    expect(head.message).toMatch(/tight head/);
  });

  it('fails a code that is not a drum', () => {
    expect(outcomes(checkDrumPackagingCode({ code: '3H1', material: 'plastic', head: 'tight' })).kind).toBe('fail');
    expect(outcomes(checkDrumPackagingCode({ code: '31HA1', material: 'plastic', head: 'tight' })).kind).toBe('fail');
  });

  it('fails an unreadable code and cautions a code with no head category', () => {
    expect(checkDrumPackagingCode({ code: 'XYZ', material: 'steel', head: 'tight' })).toEqual([expect.objectContaining({ check: 'code', outcome: 'fail' })]);
    expect(outcomes(checkDrumPackagingCode({ code: '1G', material: 'fibre', head: 'open' }))).toMatchObject({
      material: 'pass',
      head: 'caution',
    });
  });

  it("accepts other-metal codes on an 'other' drum and rejects steel", () => {
    expect(outcomes(checkDrumPackagingCode({ code: '1N1', material: 'other', head: 'tight' })).material).toBe('pass');
    expect(outcomes(checkDrumPackagingCode({ code: '1A1', material: 'other', head: 'tight' })).material).toBe('fail');
  });
});
