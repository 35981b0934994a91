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
    ['1A', /ends in a category numeral: 1A1 \(tight head, non-removable head\), 1A2 \(open head, removable head\)/],
    ['1A3', /written 1A1 .* 1A2 .*not with 3/],
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

// UN Model Regulations 6.1.2.7, the table of codes, as copied into ../shared/REFERENCES.md
// ("Packaging codes, which combinations exist") [mem: confirm against the current edition].
const UN_6_1_2_7 = (
  '1A1 1A2 1B1 1B2 1D 1G 1H1 1H2 1N1 1N2 2C1 2C2 3A1 3A2 3B1 3B2 3H1 3H2 4A 4B 4C1 4C2 4D 4F 4G 4H1 4H2 4N ' +
  '5H1 5H2 5H3 5H4 5L1 5L2 5L3 5M1 5M2 6HA1 6HA2 6HB1 6HB2 6HC 6HD1 6HD2 6HG1 6HG2 6HH1 6HH2 ' +
  '6PA1 6PA2 6PB1 6PB2 6PC 6PD1 6PD2 6PG1 6PG2 6PH1 6PH2'
).split(' ');

describe('only the codes of UN table 6.1.2.7 exist', () => {
  const letters = 'ABCDFGHLMNP'.split('');
  const numerals = ['', '1', '2', '3', '4', '5'];
  // Every well-formed single (kind 1 to 7, one letter) and composite (6, two letters) code up to category 5.
  const candidates = [
    ...['1', '2', '3', '4', '5', '7'].flatMap((k) => letters.flatMap((m) => numerals.map((n) => `${k}${m}${n}`))),
    ...letters.flatMap((i) => letters.flatMap((o) => numerals.map((n) => `6${i}${o}${n}`))),
  ];

  it('accepts exactly the listed codes among every well-formed combination', () => {
    // UN Model Regulations 6.1.2.7 [mem, ../shared/REFERENCES.md]: 59 codes, no others
    const accepted = candidates.filter((c) => parsePackagingCode(c).ok);
    expect(new Set(accepted)).toEqual(new Set(UN_6_1_2_7));
    expect(accepted).toHaveLength(59);
  });

  it.each([
    // UN Model Regulations 6.1.2.7 [mem]: jerricans are 3A, 3B and 3H only
    ['3N1', /no metal other than steel or aluminium jerrican .*steel \(3A\), aluminium \(3B\) or plastic \(3H\)/],
    // UN Model Regulations 6.1.2.7 [mem]: the fibreboard box is 4G, no numeral
    ['4G1', /fibreboard box has no category numeral; it is written 4G\./],
    // UN Model Regulations 6.1.2.7 [mem]: a fibre drum is 1G, a plywood drum 1D
    ['1D2', /plywood drum has no category numeral; it is written 1D\./],
    // UN Model Regulations 6.1.2.7 [mem]: no wooden drum (natural wood is barrels 2C and boxes 4C)
    ['1C1', /no natural wood drum/],
    // UN Model Regulations 6.1.2.7 [mem]: natural-wood boxes are 4C1 ordinary, 4C2 sift-proof walls
    ['4C3', /4C1 \(ordinary\), 4C2 \(with sift-proof walls\), not with 3/],
    // UN Model Regulations 6.1.2.7 [mem]: plastic bags 5H1 to 5H4
    ['5H5', /5H4 \(film\), not with 5/],
    // UN Model Regulations 6.1.2.7 [mem]: 6PD2 is a wickerwork hamper, there is no 6PD3
    ['6PD3', /6PD2 \(in a wickerwork hamper\)/],
    // UN Model Regulations 6.1.2.5 [mem]: kind 7 is not coded in the table
    ['7A1', /no pressure receptacle has a packaging code/],
    // UN Model Regulations 6.5.1.4.3 [mem]: rigid plastic IBCs 31H1 and 31H2 only
    ['31H3', /31H1 .* 31H2 .*not with 3/],
  ])('refuses %s and says why', (code, reason) => {
    const r = parsePackagingCode(code);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error).toMatch(reason);
  });

  it('reads the W, V and T letters after a code', () => {
    // UN Model Regulations 6.1.2.4 [mem]: W equivalent specification; 6.1.5.1.7 V; T salvage
    expect(parsed('4H2W')).toMatchObject({ code: '4H2', suffix: 'W', categoryLabel: 'solid' });
    expect(parsePackagingCode('4HW').ok).toBe(false); // 4H alone is not in the table: 4H1 or 4H2
    expect(parsed('1A2T').suffixLabel).toMatch(/salvage/);
    expect(parsed('4GV').explanation).toMatch(/^4GV: fibreboard box; V: special packaging/);
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
