/** Small pieces the response schemas share: instants, ids, the error body. */
import { z } from 'zod';

/** An RFC 3339 instant as the API writes it (`toISOString()`, UTC). */
export const instant = z.iso.datetime({ offset: true });
export const uuid = z.uuid();

/** Every error answer: `{error, issues?}` (issues name a line or a field). */
export const errorSchema = z
  .looseObject({
    error: z.string(),
    issues: z.array(z.looseObject({ line: z.number().optional(), path: z.string().optional(), message: z.string() })).optional(),
  })
  .meta({ id: 'Error', description: 'What went wrong, where, and how to fix it.' });

export const healthSchema = z.object({ ok: z.boolean(), db: z.enum(['up', 'down']) }).meta({ id: 'Health' });
export const messageSchema = z.object({ message: z.string() }).meta({ id: 'Message' });

/**
 * `schema | null` for a schema with its own id. Written as a union because the generator
 * renders `.nullable()` of a referenced schema as the bare reference (null lost); a
 * union becomes `anyOf: [{$ref}, {type: 'null'}]`.
 */
export const orNull = <T extends z.ZodType>(schema: T) => z.union([schema, z.null()]);
