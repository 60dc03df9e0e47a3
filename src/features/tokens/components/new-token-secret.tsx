import { useEffect, useRef, useState } from 'react';
import type { CreatedToken } from '@shared/schemas/tokens';
import { buttonClass } from '@/components/form-field';
import { formatMoment } from '@/lib/format';

/** The secret of a token just created: shown this once, with a copy button and a first request to try. */
export function NewTokenSecret({ created, onDone }: { created: CreatedToken; onDone: () => void }) {
  const [copied, setCopied] = useState<'yes' | 'failed' | null>(null);
  const heading = useRef<HTMLHeadingElement>(null);
  // A token made for a service user further down the page appears up here: bring it into view.
  useEffect(() => {
    heading.current?.scrollIntoView({ block: 'center' });
    heading.current?.focus();
  }, [created.id]);
  const copy = () =>
    navigator.clipboard.writeText(created.token).then(
      () => setCopied('yes'),
      () => setCopied('failed'),
    );
  const example = `curl -H "Authorization: Bearer ${created.token}" ${window.location.origin}/api/auth/me`;
  return (
    <section
      aria-labelledby="new-token-heading"
      className="rounded-lg border-2 border-seaglass-600 bg-seaglass-100 p-5 shadow-sm"
    >
      <h2 id="new-token-heading" ref={heading} tabIndex={-1} className="text-lg font-semibold text-ink-900 outline-none">
        Token “{created.name}” created
      </h2>
      <p className="mt-1 text-sm text-ink-800">
        <span className="font-semibold">Copy it now: it is shown only this once.</span> Slackwater keeps only a hash of it, so
        nobody can show it to you again. It expires {formatMoment(created.expiresAt)}.
      </p>
      <div className="mt-3 flex flex-col gap-2 sm:flex-row sm:items-center">
        <code
          aria-label="The new token"
          className="block flex-1 overflow-x-auto rounded border border-ink-300 bg-white px-3 py-2 font-mono text-sm break-all text-ink-900 select-all"
        >
          {created.token}
        </code>
        <button type="button" onClick={() => void copy()} className={buttonClass.primary}>
          {copied === 'yes' ? 'Copied' : 'Copy token'}
        </button>
      </div>
      <p aria-live="polite" className="mt-1 text-sm text-brick-700">
        {copied === 'failed' && 'The browser did not allow copying: select the token above and copy it by hand.'}
      </p>
      <p className="mt-3 text-sm text-ink-700">Try it from a shell (keep the token out of shared scripts and URLs):</p>
      <pre className="mt-1 overflow-x-auto rounded bg-ink-900 px-3 py-2 text-xs text-ink-50">{example}</pre>
      <button type="button" onClick={onDone} className={`${buttonClass.secondary} mt-4`}>
        I have stored it
      </button>
    </section>
  );
}
