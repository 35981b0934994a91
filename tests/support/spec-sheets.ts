import iconv from 'iconv-lite';

// Spec sheets written in the encodings suppliers send, generated with iconv-lite. The names are invented.

export const TUBE_HEADER = 'supplier,part_number,thread,length_mm,bore_mm,od_mm,material,key,channels';

/** Supplier names and materials as they would be written in each encoding's region. */
export const REGIONAL: Record<string, { names: string[]; materials: string[] }> = {
  'windows-1252': {
    names: [
      'Müller Rohrtechnik GmbH',
      'Société Générale des Tubes',
      'Peña Ingeniería S.L.',
      'Ångström Rør AS',
      'Krämer & Söhne',
      'Tubos Ibéricos',
      'Jürgen Weiß KG',
      'Øresund Væsker',
      'Zoë Brontë Ltd',
    ],
    materials: ['PFA', 'PVDF – grade “A”', 'PTFE (größer)'],
  },
  'ISO-8859-1': {
    names: ['Größe Gießerei', 'Façade Øst', 'Irmão Ltda.', 'Hélène Côté SA', 'Müller Rohrtechnik GmbH'],
    materials: ['PFA', 'PTFE (größer)'],
  },
  Shift_JIS: { names: ['東雲精機', '株式会社ミナト工業', '大和化成', '北斗フッ素工業株式会社', 'ヤマト精密'], materials: ['PFA（高純度）', 'ＰＶＤＦ樹脂', 'フッ素樹脂'] },
  Big5: { names: ['台灣精密管件股份有限公司', '新竹化工材料', '桃園氟塑膠', '高雄精密機械'], materials: ['聚四氟乙烯', '高純度氟樹脂管'] },
  'EUC-KR': { names: ['한국정밀공업 주식회사', '대한화학소재', '서울정밀', '부산불소수지'], materials: ['불소수지', '고순도 테플론 튜브'] },
  // Encodings Bungwise does not read: a sheet in one of them must be refused, never read as something else.
  'windows-1251': { names: ['Трубный завод Север', 'ООО Химпласт', 'Уральские фторопласты'], materials: ['фторопласт'] },
  'windows-1250': { names: ['Łódzkie Zakłady Rur', 'Škoda Plasty s.r.o.', 'Győri Csőgyár'], materials: ['PFA'] },
  GB18030: { names: ['上海精密管件有限公司', '苏州氟塑料', '深圳半导体设备'], materials: ['聚四氟乙烯'] },
  'EUC-JP': { names: ['東雲精機', '株式会社ミナト工業', '大和化成'], materials: ['PFA'] },
  'windows-1253': { names: ['Ελληνικά Πλαστικά ΑΕ', 'Σωλήνες Αθηνών'], materials: ['PFA'] },
};
export const READ_ENCODINGS = ['windows-1252', 'ISO-8859-1', 'Shift_JIS', 'Big5', 'EUC-KR'];
export const REFUSED_ENCODINGS = ['windows-1251', 'windows-1250', 'GB18030', 'EUC-JP', 'windows-1253'];

/** A small deterministic generator, so a failing sheet can be found again. */
export function seeded(seed: number) {
  let s = seed;
  return (n: number) => {
    s = (s * 1103515245 + 12345) & 0x7fffffff;
    return (s >>> 16) % n;
  };
}

/**
 * A dip-tube sheet of `rows` rows in `encoding`, the first `regional` of them with a regional supplier name (and
 * sometimes material); the rest plain ASCII, which is what makes short files hard to place.
 */
export function tubeSheet(encoding: string, rows: number, regional: number, rnd = seeded(rows * 31 + regional), supplier = (i: number) => `Harbor Plastics ${i}`) {
  const { names, materials } = REGIONAL[encoding];
  const lines = [TUBE_HEADER];
  for (let i = 0; i < rows; i++) {
    const local = i < regional;
    const name = local ? names[rnd(names.length)] : supplier(i);
    const material = local && rnd(2) ? materials[rnd(materials.length)] : 'PFA';
    lines.push(`${name},DT-${1000 + i},NPS-2,${830 + rnd(20)},19,25.4,${material},,feed`);
  }
  const text = lines.join('\r\n') + '\r\n';
  return { text, bytes: iconv.encode(text, encoding) };
}
