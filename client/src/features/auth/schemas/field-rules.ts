import { passwordProblem } from '@endgrain/shared';
import { z } from 'zod';

// Field rules the forms share. The password rule is the server's own (from shared), so people hear
// about a too-short or too-common password before sending it; the server still checks everything.
export { MIN_PASSWORD_LENGTH } from '@endgrain/shared';

export const fieldRules = {
  email: z
    .string()
    .trim()
    .min(1, 'Enter your e-mail address.')
    .pipe(z.email({ error: 'That does not look like an e-mail address. Check it reads like name@example.org.' })),
  /** For choosing a password: sign-up and reset. */
  newPassword: z.string().superRefine((password, context) => {
    const problem = passwordProblem(password);
    if (problem) context.addIssue({ code: 'custom', message: problem });
  }),
  /** For signing in: whatever the account has, just not empty. */
  currentPassword: z.string().min(1, 'Enter your password.'),
  displayName: z
    .string()
    .trim()
    .min(1, 'Enter the name other people will see.')
    .max(60, 'Use at most 60 characters.'),
};
