/** The one application error type: services throw it, the error handler answers it. */
export interface ErrorIssue {
  readonly line?: number;
  readonly path?: string;
  readonly message: string;
}

export class AppError extends Error {
  constructor(
    readonly code: string,
    message: string,
    readonly status: number,
    readonly issues?: readonly ErrorIssue[],
    readonly extra?: Record<string, unknown>,
  ) {
    super(message);
    this.name = 'AppError';
  }
}

export const notFound = (what: string) => new AppError('not_found', `${what} was not found.`, 404);
export const forbidden = (message = 'Your role does not allow this.') => new AppError('forbidden', message, 403);
export const conflict = (message: string) => new AppError('conflict', message, 409);
export const unprocessable = (message: string, issues?: readonly ErrorIssue[]) =>
  new AppError('invalid_input', message, 422, issues);
