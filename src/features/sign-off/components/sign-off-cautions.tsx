import { SIGN_OFF_CAUTIONS } from '@shared/schemas/sign-off';

/** The cautions of DESIGN section 8, on every sign-off screen (the export carries the same words). */
export function SignOffCautions() {
  return (
    <aside aria-label="Before you sign off" className="rounded border border-amber-500 bg-amber-100 p-4 text-sm text-ink-900">
      <p className="font-semibold text-amber-600">Before you sign off</p>
      <ul className="mt-2 list-disc space-y-1 pl-5">
        {SIGN_OFF_CAUTIONS.map((line) => (
          <li key={line}>{line}</li>
        ))}
      </ul>
    </aside>
  );
}
