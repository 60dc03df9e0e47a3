/**
 * Compile-time proof that a response schema describes exactly its TypeScript type:
 * `const check: SameType<z.infer<typeof schema>, Type> = true` stops compiling when a
 * field is added to one and not the other, so the OpenAPI document cannot drift from
 * what the server sends.
 */
export type SameType<A, B> = [A] extends [B] ? ([B] extends [A] ? true : false) : false;
