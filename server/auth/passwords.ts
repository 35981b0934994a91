import bcrypt from 'bcryptjs';

export const MIN_PASSWORD_LENGTH = 12;

// A short list of passwords that appear at the top of every leaked-password list, plus this product's own
// name: long enough to pass the length rule, still guessed first.
const COMMON = new Set([
  'password1234', 'password12345', '123456789012', '1234567890123', 'qwertyuiop12', 'qwerty123456', 'iloveyou1234',
  'administrator', 'letmein12345', 'welcome12345', 'changeme1234', 'passw0rd1234', 'aaaaaaaaaaaa', '111111111111',
  'abc123456789', 'football1234', 'monkey123456', 'bungwise1234', 'bungwisebungwise', 'password123!',
]);

/** Returns a reason when the password is not acceptable, or null. */
export function passwordProblem(password: string): string | null {
  if (password.length < MIN_PASSWORD_LENGTH) return `must be at least ${MIN_PASSWORD_LENGTH} characters`;
  if (password.length > 200) return 'must be at most 200 characters';
  if (COMMON.has(password.toLowerCase())) return 'is too common; choose another';
  return null;
}

export const hashPassword = (password: string) => bcrypt.hash(password, 10);
export const verifyPassword = (password: string, hash: string) => bcrypt.compare(password, hash);
