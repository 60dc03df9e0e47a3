import { ApiError } from '@/lib/api-client';

/** The server's issues for one field (`path`), joined for display beside it. */
export function fieldError(error: unknown, field: string): string | undefined {
  if (!(error instanceof ApiError)) return undefined;
  const messages = error.issues.filter((i) => i.path === field).map((i) => i.message);
  return messages.length ? messages.join(' ') : undefined;
}

/** The error's sentence for the form as a whole, unless every issue sits beside a field. */
export function formError(error: unknown, fields: readonly string[]): string | undefined {
  if (!error) return undefined;
  if (error instanceof ApiError && error.issues.length > 0 && error.issues.every((i) => i.path && fields.includes(i.path)))
    return undefined;
  return error instanceof Error ? error.message : 'Something went wrong. Try again.';
}

/** Only same-site paths are followed after sign-in, so a link cannot send people elsewhere. */
export function safeNextPath(next: string | null): string {
  return next && next.startsWith('/') && !next.startsWith('//') && !next.startsWith('/\\') ? next : '/';
}
