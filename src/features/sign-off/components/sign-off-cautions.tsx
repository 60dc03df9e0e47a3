import { SIGN_OFF_CAUTIONS } from '@shared/schemas/sign-off';

/** The cautions (docs/model.md), on every sign-off screen (the export carries the same words). */
export function SignOffCautions() {
  return (
    <aside aria-label="Before you sign off" className="rounded border border-amber-500 bg-amber-100 p-4 text-sm text-ink-900">
      <p className="font-semibold text-amber-700">Before you sign off</p>
      <ul className="mt-2 list-disc space-y-1 pl-5">
        {SIGN_OFF_CAUTIONS.map((line) => (
          <li key={line}>{line}</li>
        ))}
      </ul>
    </aside>
  );
}

/**
 * The same reminder where the full cautions are already on the page (the plan page):
 * one short paragraph that points to them instead of repeating the list.
 */
export function SignOffCautionsReminder({ cautionsId }: { cautionsId: string }) {
  return (
    // A note, not an aside: it sits inside the sign-off region (complementary landmarks stay top level).
    <div
      role="note"
      aria-label="Before you sign off"
      className="rounded border border-amber-500 bg-amber-100 p-3 text-sm text-ink-900"
    >
      <span className="font-semibold text-amber-700">Before you sign off</span>, read the{' '}
      <a href={`#${cautionsId}`} className="font-semibold underline">
        cautions
      </a>{' '}
      above: the interconnection agreement, the grid code and the system operator&rsquo;s instructions, the battery maker&rsquo;s
      operating limits and the site&rsquo;s fire and safety requirements come before this schedule; qualified personnel decide
      dispatch.
    </div>
  );
}
