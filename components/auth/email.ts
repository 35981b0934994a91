/** The sign-in and "forgot password" forms' check of a typed address, in plain words (the server checks again). */
export function emailProblem(email: string): string | null {
  if (!email.trim()) return 'Enter your work e-mail address.';
  if (!/^[^\s@]+@[^\s@]+\.[^\s@]+$/.test(email.trim())) return 'This does not look like an e-mail address.';
  return null;
}
