// The tight-head opening rule: a drum recorded as tight head whose opening is wider than a tight head allows
// is not what its record says (by the regulations it is an open-head drum), so the record or the drum is wrong.

import { formatLength } from '../units';
import { caution, notChecked, openingName, pass, type RuleFn } from './rule-kit';

/**
 * Largest filling or emptying opening of a non-removable-head (tight head) drum, mm: 7.0 cm in diameter; a drum
 * with larger openings counts as removable head [pub, from memory: UN Model Regulations 6.1.4.1.5 for steel
 * drums; similar text for the other materials].
 */
export const TIGHT_HEAD_MAX_OPENING_MM = 70;

export const checkTightHeadOpenings: RuleFn = ({ drum }) => {
  if (!drum.head) return notChecked('tight-head', "not checked: the drum's head type is not recorded");
  const limit = formatLength(TIGHT_HEAD_MAX_OPENING_MM, 'mm');
  if (drum.head === 'open') return pass('tight-head', `This drum has a removable head, so the ${limit} limit on a tight head's openings does not apply.`);
  const measured = drum.openings.flatMap((o, i) => (typeof o.boreMm === 'number' ? [{ name: openingName(o, i), boreMm: o.boreMm }] : []));
  if (!measured.length) return notChecked('tight-head', 'not checked: no opening has its bore recorded');
  const widest = measured.reduce((a, b) => (b.boreMm > a.boreMm ? b : a));
  const numbers = { widestBoreMm: widest.boreMm, maxBoreMm: TIGHT_HEAD_MAX_OPENING_MM };
  const bore = formatLength(widest.boreMm, 'mm');
  if (widest.boreMm > TIGHT_HEAD_MAX_OPENING_MM) {
    return caution(
      'tight-head',
      `This drum is recorded as tight head, but its ${widest.name} is ${bore} across, wider than the ${limit} a tight head's opening may be (UN 6.1.4.1.5): a drum with it is an open-head drum, so check the drum and its record before it is tapped.`,
      numbers,
    );
  }
  return pass('tight-head', `Every opening of this tight-head drum is within ${limit} (widest: ${widest.name}, ${bore}).`, numbers);
};
