/**
 * Canonical JSON after RFC 8785 (JSON Canonicalization Scheme, JCS): object
 * members sorted by the UTF-16 code units of their names, no whitespace,
 * strings and numbers serialised as ECMAScript's JSON.stringify does
 * (RFC 8785 sections 3.2.2 and 3.2.3). The plan checksum hashes this text, so
 * the same plan gives the same bytes whatever order PostgreSQL's jsonb hands
 * the keys back in (jsonb does not keep key order).
 */

export class CanonicalJsonError extends Error {}

export function canonicalJson(value: unknown): string {
  return write(value, '$');
}

function write(value: unknown, path: string): string {
  if (value === null) return 'null';
  switch (typeof value) {
    case 'boolean':
      return value ? 'true' : 'false';
    case 'string':
      return JSON.stringify(value);
    case 'number':
      // JSON has no NaN or Infinity (RFC 8785 section 3.2.2.3 forbids them).
      if (!Number.isFinite(value)) throw new CanonicalJsonError(`${path} is ${value}, which JSON cannot represent.`);
      return JSON.stringify(value);
    case 'object': {
      if (Array.isArray(value)) {
        // As JSON.stringify does, a missing array element is written as null.
        return `[${value.map((item, i) => (item === undefined ? 'null' : write(item, `${path}[${i}]`))).join(',')}]`;
      }
      const record = value as Record<string, unknown>;
      if (typeof (record as { toJSON?: unknown }).toJSON === 'function') {
        return write((record as { toJSON: () => unknown }).toJSON(), path);
      }
      // Default sort compares UTF-16 code units, which is what RFC 8785 section 3.2.3 asks for.
      const keys = Object.keys(record)
        .filter((k) => record[k] !== undefined)
        .sort();
      return `{${keys.map((k) => `${JSON.stringify(k)}:${write(record[k], `${path}.${k}`)}`).join(',')}}`;
    }
    default:
      throw new CanonicalJsonError(`${path} is a ${typeof value}, which JSON cannot represent.`);
  }
}
