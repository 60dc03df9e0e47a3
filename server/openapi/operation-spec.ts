/**
 * How one API operation is described: words for people, the zod schemas of what it
 * takes and answers (shared/schemas), and the error statuses it can give beyond the
 * ones every protected route has. The roles come from the access table, not from here.
 */
import { z, type ZodType } from 'zod';

export interface SuccessSpec {
  description: string;
  /** JSON body; absent for 204 and for non-JSON answers. */
  schema?: ZodType;
  /** A CSV file instead of JSON. */
  csv?: true;
}

export interface OperationSpec {
  tag: string;
  summary: string;
  description?: string;
  /** Path parameters; `:id` params default to a UUID. */
  params?: z.ZodObject;
  query?: z.ZodType;
  /** `application/json` request body. */
  body?: ZodType;
  /** `multipart/form-data` request body. */
  form?: ZodType;
  responses: Record<number, SuccessSpec>;
  /** Error statuses this operation can give besides 401/403 (protected), 404 (path ids) and 422 (bodies, queries). */
  errors?: readonly number[];
}

export const uuidParams = z.object({ id: z.uuid().meta({ description: 'The id, a UUID.' }) });
