import { ErrorState, LoadingState } from '@/components/query-state';
import { useMailMessage } from '../api/get-mail-message';
import { formatMoment } from '@/lib/format';

/** Plain text with its web addresses as links (opened in a new tab, without a Referer). */
function LinkedText({ text }: { text: string }) {
  const parts = text.split(/(https?:\/\/[^\s<>"]+)/g);
  return (
    <pre className="font-sans text-sm leading-relaxed whitespace-pre-wrap text-ink-900">
      {parts.map((part, i) =>
        i % 2 === 1 ? (
          <a key={i} href={part} target="_blank" rel="noreferrer noopener" className="break-all text-seaglass-700 underline">
            {part}
          </a>
        ) : (
          part
        ),
      )}
    </pre>
  );
}

export function MailMessageView({ id }: { id: number | null }) {
  const message = useMailMessage(id);
  if (id === null) return <p className="p-6 text-ink-500">Choose a message to read it.</p>;
  if (message.isPending) return <LoadingState label="Loading the message…" />;
  if (message.isError) return <ErrorState error={message.error} />;
  const m = message.data;
  return (
    <article aria-labelledby="mail-subject" className="space-y-4 p-6">
      <header className="space-y-1 border-b border-ink-100 pb-4">
        <h2 id="mail-subject" className="text-lg font-semibold text-ink-900">
          {m.subject || '(no subject)'}
        </h2>
        <dl className="grid grid-cols-[auto_1fr] gap-x-3 text-sm text-ink-700">
          <dt className="font-medium">From</dt>
          <dd className="break-all">{m.from}</dd>
          <dt className="font-medium">To</dt>
          <dd className="break-all">{m.to}</dd>
          <dt className="font-medium">Sent</dt>
          <dd>{formatMoment(m.sentAt)}</dd>
        </dl>
      </header>
      <LinkedText text={m.text} />
      {m.html && (
        <details className="text-sm">
          <summary className="cursor-pointer text-ink-700">HTML version</summary>
          {/* sandbox without permissions: no scripts, no forms, no navigation of this page */}
          <iframe
            title={`HTML version of ${m.subject}`}
            sandbox=""
            srcDoc={m.html}
            className="mt-2 h-80 w-full rounded border border-ink-100 bg-white"
          />
        </details>
      )}
    </article>
  );
}
