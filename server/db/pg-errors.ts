/** PostgreSQL error codes behind query errors, and the unique-violation answer every module shares. */

/** The PostgreSQL error code behind a (possibly Drizzle-wrapped) query error. */
export function pgErrorCode(error: unknown): string | undefined {
  for (let e: unknown = error; e && typeof e === 'object'; e = (e as { cause?: unknown }).cause) {
    const code = (e as { code?: unknown }).code;
    if (typeof code === 'string' && /^[0-9A-Z]{5}$/.test(code)) return code;
  }
  return undefined;
}

const UNIQUE_VIOLATION = '23505';
export const FOREIGN_KEY_VIOLATION = '23503';

/** Runs `work`; a unique-constraint violation becomes `conflictError` (a clear 409 instead of a 500). */
export async function withUniqueCheck<T>(work: () => Promise<T>, conflictError: () => Error): Promise<T> {
  try {
    return await work();
  } catch (error) {
    if (pgErrorCode(error) === UNIQUE_VIOLATION) throw conflictError();
    throw error;
  }
}
