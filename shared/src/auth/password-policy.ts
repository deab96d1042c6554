import { COMMON_PASSWORDS } from './common-passwords.js';

export const MIN_PASSWORD_LENGTH = 10;

/** Returns a user-readable reason the password is refused, or null when it is acceptable. */
export function passwordProblem(password: string, context: { email?: string } = {}): string | null {
  if (password.length < MIN_PASSWORD_LENGTH) {
    return `Password must be at least ${MIN_PASSWORD_LENGTH} characters.`;
  }
  if (password.length > 200) return 'Password must be at most 200 characters.';
  const lower = password.toLowerCase();
  if (COMMON_PASSWORDS.has(lower)) {
    return 'That password is on a list of commonly used passwords; choose another.';
  }
  if (/^(.)\1+$/.test(password)) return 'Password must not be one repeated character.';
  const local = context.email?.split('@')[0]?.toLowerCase();
  if (local && local.length >= 4 && lower.includes(local)) {
    return 'Password must not contain your e-mail name.';
  }
  return null;
}

/** Lower-cases and trims; rejects anything that is not a plausible single address. */
export function normaliseEmail(raw: string): string | null {
  const email = raw.trim().toLowerCase();
  if (email.length > 254) return null;
  return /^[^\s@]+@[^\s@]+\.[^\s@]+$/.test(email) ? email : null;
}
