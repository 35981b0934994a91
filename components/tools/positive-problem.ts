/** The message for a field that must hold a positive number, or null when it does. */
export function positiveProblem(value: number | null, required: boolean): string | null {
  if (value === null) return required ? 'Enter a number.' : null;
  if (Number.isNaN(value)) return 'Enter a number, like 2.375.';
  if (value <= 0) return 'Enter a number above 0.';
  return null;
}
