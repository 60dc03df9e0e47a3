import type { JsonSchema } from '../api/get-openapi';

export type SchemaLookup = (ref: string) => JsonSchema | undefined;

const refName = (ref: string) => ref.split('/').pop() ?? ref;

/** A one-line name for a schema: `string (date-time)`, `array of Plan`, `one of: …`. */
export function typeLabel(schema: JsonSchema | undefined): string {
  if (!schema) return 'any';
  if (schema.$ref) return refName(schema.$ref);
  const alternatives = schema.anyOf ?? schema.oneOf;
  if (alternatives) return alternatives.map(typeLabel).join(' or ');
  if (schema.allOf) return schema.allOf.map(typeLabel).join(' and ');
  if (schema.enum) return schema.enum.map((v) => JSON.stringify(v)).join(' | ');
  if (schema.const !== undefined) return JSON.stringify(schema.const);
  const types = Array.isArray(schema.type) ? schema.type : schema.type ? [schema.type] : [];
  const named = types.map((t) => (t === 'array' ? `array of ${typeLabel(schema.items)}` : t));
  const label = named.join(' or ') || 'any';
  return schema.format ? `${label} (${schema.format})` : label;
}

function limits(schema: JsonSchema): string {
  const parts: string[] = [];
  if (schema.minimum !== undefined) parts.push(`≥ ${schema.minimum}`);
  if (schema.exclusiveMinimum !== undefined) parts.push(`> ${schema.exclusiveMinimum}`);
  if (schema.maximum !== undefined) parts.push(`≤ ${schema.maximum}`);
  if (schema.minLength !== undefined) parts.push(`at least ${schema.minLength} characters`);
  if (schema.maxLength !== undefined) parts.push(`at most ${schema.maxLength} characters`);
  if (schema.default !== undefined) parts.push(`default ${JSON.stringify(schema.default)}`);
  return parts.join(', ');
}

/** The object schema behind a schema, following one reference or one nullable alternative. */
function objectOf(schema: JsonSchema | undefined, lookup: SchemaLookup): JsonSchema | undefined {
  if (!schema) return undefined;
  if (schema.$ref) return objectOf(lookup(schema.$ref), lookup);
  if (schema.properties) return schema;
  if (schema.items) return objectOf(schema.items, lookup);
  const alternatives = (schema.anyOf ?? schema.oneOf ?? []).filter((s) => s.type !== 'null');
  return alternatives.length === 1 ? objectOf(alternatives[0], lookup) : undefined;
}

/** Properties of an object schema as a nested list; nested objects open on demand. */
export function SchemaView({
  schema,
  lookup,
  depth = 0,
}: {
  schema: JsonSchema | undefined;
  lookup: SchemaLookup;
  depth?: number;
}) {
  const object = objectOf(schema, lookup);
  if (!object?.properties) return <p className="font-mono text-xs text-ink-700">{typeLabel(schema)}</p>;
  const required = new Set(object.required ?? []);
  return (
    <ul className={`space-y-1 text-sm ${depth > 0 ? 'mt-1 border-l border-ink-100 pl-3' : ''}`}>
      {Object.entries(object.properties).map(([name, property]) => {
        const nested = depth < 4 ? objectOf(property, lookup) : undefined;
        const extra = [limits(property), property.description].filter(Boolean).join(' — ');
        const line = (
          <>
            <code className="font-mono text-ink-900">{name}</code>
            {!required.has(name) && <span className="ml-1 text-xs text-ink-500">optional</span>}
            <span className="ml-2 font-mono text-xs text-seaglass-800">{typeLabel(property)}</span>
            {extra && <span className="ml-2 text-xs text-ink-700">{extra}</span>}
          </>
        );
        return (
          <li key={name}>
            {nested ? (
              <details>
                <summary className="cursor-pointer">{line}</summary>
                <SchemaView schema={property} lookup={lookup} depth={depth + 1} />
              </details>
            ) : (
              line
            )}
          </li>
        );
      })}
    </ul>
  );
}
