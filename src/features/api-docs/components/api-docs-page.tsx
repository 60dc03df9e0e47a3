import { useMemo, useState } from 'react';
import { inputClass } from '@/components/form-field';
import { ErrorState, LoadingState } from '@/components/query-state';
import { useOpenApi, type OpenApiDocument, type Operation } from '../api/get-openapi';
import { InlineCode } from './inline-code';
import { OperationCard } from './operation-card';

interface Entry {
  method: string;
  path: string;
  operation: Operation;
}

function groupByTag(doc: OpenApiDocument, filter: string): [string, Entry[]][] {
  const wanted = filter.trim().toLowerCase();
  const groups = new Map<string, Entry[]>((doc.tags ?? []).map((t) => [t.name, []]));
  for (const [path, item] of Object.entries(doc.paths)) {
    for (const [method, operation] of Object.entries(item)) {
      const text = `${method} ${path} ${operation.summary ?? ''}`.toLowerCase();
      if (wanted && !text.includes(wanted)) continue;
      const tag = operation.tags?.[0] ?? 'Other';
      groups.set(tag, [...(groups.get(tag) ?? []), { method, path, operation }]);
    }
  }
  return [...groups].filter(([, entries]) => entries.length > 0);
}

/** The API reference, read from the server's own OpenAPI document (nothing fetched from elsewhere). */
export function ApiDocsPage() {
  const doc = useOpenApi();
  const [filter, setFilter] = useState('');
  const groups = useMemo(() => (doc.data ? groupByTag(doc.data, filter) : []), [doc.data, filter]);
  const lookup = (ref: string) => doc.data?.components?.schemas?.[ref.split('/').pop() ?? ''];
  const count = groups.reduce((n, [, entries]) => n + entries.length, 0);
  return (
    <section className="space-y-6">
      <div>
        <h1 className="text-2xl font-semibold text-ink-900">API reference</h1>
        {doc.data?.info.description && (
          <p className="mt-1 max-w-3xl text-ink-700">
            <InlineCode text={doc.data.info.description} />
          </p>
        )}
        <p className="mt-2 text-sm text-ink-700">
          The machine-readable form is{' '}
          <a href="/api/openapi.json" className="font-medium text-seaglass-800 underline">
            /api/openapi.json
          </a>{' '}
          (OpenAPI 3.1).
        </p>
      </div>
      <label className="flex max-w-md flex-col gap-1 text-sm font-medium text-ink-800">
        Find an operation
        <input
          type="search"
          value={filter}
          onChange={(e) => setFilter(e.target.value)}
          placeholder="e.g. plans, upload, token"
          className={inputClass}
        />
      </label>
      {doc.isPending && <LoadingState label="Loading the API description…" />}
      {doc.isError && <ErrorState error={doc.error} onRetry={() => void doc.refetch()} />}
      {doc.data && (
        <p aria-live="polite" className="text-sm text-ink-700">
          {count} operation{count === 1 ? '' : 's'}
        </p>
      )}
      {groups.map(([tag, entries]) => (
        <section key={tag} aria-labelledby={`tag-${tag}`} className="space-y-2">
          <h2 id={`tag-${tag}`} className="text-xl font-semibold text-ink-900">
            {tag}
          </h2>
          {doc.data?.tags?.find((t) => t.name === tag)?.description && (
            <p className="text-sm text-ink-700">{doc.data.tags.find((t) => t.name === tag)?.description}</p>
          )}
          {entries.map((e) => (
            <OperationCard
              key={`${e.method} ${e.path}`}
              method={e.method}
              path={e.path}
              operation={e.operation}
              lookup={lookup}
            />
          ))}
        </section>
      ))}
    </section>
  );
}
