/**
 * New-password rules beyond length (length is in the shared zod schema): no common
 * password, no common word padded with digits or symbols, no single repeated
 * character, no context words (ASVS 5.0 6.2.4, 6.2.11). No composition rules
 * (ASVS 4.0.3 2.1.9): any printable characters, spaces included, are welcome.
 */
import { newPasswordSchema } from '@shared/schemas/auth';
import type { ErrorIssue } from '../http/app-error';
import { unprocessable } from '../http/app-error';
import { commonPasswords, guessableBaseWords } from './common-passwords';

export interface PasswordContext {
  email?: string;
  name?: string;
}

/** Problems with a proposed password, empty when it is acceptable. */
export function passwordProblems(password: string, context: PasswordContext = {}): string[] {
  const shape = newPasswordSchema.safeParse(password);
  if (!shape.success) return shape.error.issues.map((i) => i.message);
  const lower = password.normalize('NFKC').toLowerCase();
  const problems: string[] = [];
  const core = lower.replace(/[^\p{L}]+/gu, '');
  if (commonPasswords.has(lower) || guessableBaseWords.has(core)) {
    problems.push('This password is on the list of the most common passwords. Choose a longer phrase of unrelated words.');
  } else if (new Set(lower).size === 1) {
    problems.push('A password of one repeated character is easy to guess.');
  }
  if (lower.includes('slackwater')) problems.push('Do not use the name of this application in your password.');
  const local = context.email?.split('@')[0]?.toLowerCase();
  if (local && local.length >= 4 && lower.includes(local)) problems.push('Do not use your e-mail address in your password.');
  const name = context.name?.toLowerCase().replace(/\s+/g, '');
  if (name && name.length >= 4 && lower.replace(/\s+/g, '').includes(name))
    problems.push('Do not use your name in your password.');
  return problems;
}

/** Throws a 422 naming the field when the password is not acceptable. */
export function assertAcceptablePassword(password: string, context: PasswordContext, field = 'password'): void {
  const problems = passwordProblems(password, context);
  if (problems.length === 0) return;
  const issues: ErrorIssue[] = problems.map((message) => ({ path: field, message }));
  throw unprocessable('The new password is not acceptable: see issues.', issues);
}
