/**
 * The password rule, one home for the server (authoritative) and the forms (the same message before sending).
 * Length over composition rules: a long phrase is both easier to type with gloves and harder to guess.
 */
export const MIN_PASSWORD_LENGTH = 12;
export const MAX_PASSWORD_LENGTH = 200;

/** Said beside every field where a new password is chosen. */
export const PASSWORD_RULE_TEXT = `At least ${MIN_PASSWORD_LENGTH} characters. A few words in a row work well; common passwords are refused.`;

/** How long an e-mailed reset link works. */
export const RESET_LINK_MINUTES = 30;

// A short list of passwords that appear at the top of every leaked-password list, plus this product's own
// name: long enough to pass the length rule, still guessed first.
const COMMON = new Set([
  'password1234',
  'password12345',
  '123456789012',
  '1234567890123',
  'qwertyuiop12',
  'qwerty123456',
  'iloveyou1234',
  'administrator',
  'letmein12345',
  'welcome12345',
  'changeme1234',
  'passw0rd1234',
  'aaaaaaaaaaaa',
  '111111111111',
  'abc123456789',
  'football1234',
  'monkey123456',
  'bungwise1234',
  'bungwisebungwise',
  'password123!',
]);

/** Returns a reason when the password is not acceptable (worded to follow the field's name), or null. */
export function passwordProblem(password: string): string | null {
  if (password.length < MIN_PASSWORD_LENGTH) return `must be at least ${MIN_PASSWORD_LENGTH} characters`;
  if (password.length > MAX_PASSWORD_LENGTH) return `must be at most ${MAX_PASSWORD_LENGTH} characters`;
  if (COMMON.has(password.toLowerCase())) return 'is too common; choose another';
  return null;
}

/** Said for every accepted "forgot password" request, whether or not the address belongs to anyone. */
export const FORGOT_ANSWER = `If that address belongs to an active account, a link to choose a new password is on its way. It works once, for ${RESET_LINK_MINUTES} minutes.`;
