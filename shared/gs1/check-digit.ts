// The GS1 standard check digit (GS1 General Specifications §7.9.1) [mem: confirm against the current edition].

/** The check digit for the digits before it: weights 3, 1, 3, 1… from the right; (10 − sum mod 10) mod 10. */
export function gs1CheckDigit(digits: string): number {
  let sum = 0;
  for (let i = 0; i < digits.length; i += 1) {
    const digit = digits.charCodeAt(digits.length - 1 - i) - 48;
    sum += digit * (i % 2 === 0 ? 3 : 1);
  }
  return (10 - (sum % 10)) % 10;
}

/** True when the last digit of an all-digit key (a GTIN-14, say) is the check digit of the ones before it. */
export function hasValidCheckDigit(key: string): boolean {
  if (!/^\d{2,}$/.test(key)) return false;
  return gs1CheckDigit(key.slice(0, -1)) === Number(key[key.length - 1]);
}
