import { roleLabels, type Role } from '@shared/schemas/auth';
import type { Operation } from '../api/get-openapi';
import { InlineCode } from './inline-code';
import { SchemaView, typeLabel, type SchemaLookup } from './schema-view';

const methodTone: Record<string, string> = {
  get: 'bg-seaglass-100 text-seaglass-800',
  post: 'bg-ink-800 text-white',
  patch: 'bg-amber-100 text-ink-900',
  delete: 'bg-brick-100 text-brick-700',
};

function Roles({ operation }: { operation: Operation }) {
  if (operation['x-public'])
    return <span className="rounded bg-ink-100 px-2 py-0.5 text-xs font-medium">Anyone, signed in or not</span>;
  return (
    <span className="flex flex-wrap gap-1" aria-label="Roles allowed">
      {(operation['x-roles'] ?? []).map((r) => (
        <span key={r} className="rounded bg-ink-100 px-2 py-0.5 text-xs font-medium text-ink-800">
          {roleLabels[r as Role] ?? r}
        </span>
      ))}
      {operation['x-api-token'] === false && (
        <span className="rounded bg-amber-100 px-2 py-0.5 text-xs font-medium text-ink-900">Browser session only</span>
      )}
    </span>
  );
}

/** One operation: method, path, who may call it, what it takes and what it answers. */
export function OperationCard({
  method,
  path,
  operation,
  lookup,
}: {
  method: string;
  path: string;
  operation: Operation;
  lookup: SchemaLookup;
}) {
  const body = operation.requestBody ? Object.entries(operation.requestBody.content)[0] : undefined;
  const params = operation.parameters ?? [];
  return (
    <details id={operation.operationId} className="group rounded-lg border border-ink-100 bg-white shadow-sm open:shadow-md">
      <summary className="flex cursor-pointer flex-wrap items-center gap-x-3 gap-y-1 px-4 py-3">
        <span
          className={`w-16 rounded px-2 py-0.5 text-center font-mono text-xs font-bold uppercase ${methodTone[method] ?? 'bg-ink-100'}`}
        >
          {method}
        </span>
        <code className="font-mono text-sm font-semibold break-all text-ink-900">{path}</code>
        <span className="text-sm text-ink-700">
          <InlineCode text={operation.summary ?? ''} />
        </span>
      </summary>
      <div className="space-y-4 border-t border-ink-100 px-4 py-4 text-sm">
        {operation.description && (
          <p className="text-ink-800">
            <InlineCode text={operation.description} />
          </p>
        )}
        <div className="flex flex-wrap items-center gap-2">
          <span className="font-semibold text-ink-800">Who:</span>
          <Roles operation={operation} />
        </div>
        {params.length > 0 && (
          <div>
            <h4 className="font-semibold text-ink-800">Parameters</h4>
            <ul className="mt-1 space-y-1">
              {params.map((p) => (
                <li key={`${p.in}-${p.name}`}>
                  <code className="font-mono text-ink-900">{p.name}</code>
                  <span className="ml-1 text-xs text-ink-500">
                    in {p.in}
                    {p.required ? '' : ', optional'}
                  </span>
                  <span className="ml-2 font-mono text-xs text-seaglass-800">{typeLabel(p.schema)}</span>
                  {p.description && <span className="ml-2 text-xs text-ink-700">{p.description}</span>}
                </li>
              ))}
            </ul>
          </div>
        )}
        {body && (
          <div>
            <h4 className="font-semibold text-ink-800">
              Request body <span className="font-mono text-xs font-normal text-ink-500">{body[0]}</span>
            </h4>
            <SchemaView schema={body[1].schema} lookup={lookup} />
          </div>
        )}
        <div>
          <h4 className="font-semibold text-ink-800">Answers</h4>
          <ul className="mt-1 space-y-2">
            {Object.entries(operation.responses).map(([status, response]) => {
              const content = response.content ? Object.entries(response.content)[0] : undefined;
              const success = status.startsWith('2');
              return (
                <li key={status}>
                  <span className={`font-mono text-xs font-bold ${success ? 'text-seaglass-800' : 'text-ink-700'}`}>
                    {status}
                  </span>
                  <span className="ml-2 text-ink-800">
                    <InlineCode text={response.description} />
                  </span>
                  {content && !success && (
                    <span className="ml-2 font-mono text-xs text-ink-500">{typeLabel(content[1].schema)}</span>
                  )}
                  {content && success && (
                    <div className="mt-1 ml-8">
                      <span className="font-mono text-xs text-ink-500">{content[0]}</span>
                      {content[0] === 'application/json' && <SchemaView schema={content[1].schema} lookup={lookup} />}
                    </div>
                  )}
                </li>
              );
            })}
          </ul>
        </div>
      </div>
    </details>
  );
}
