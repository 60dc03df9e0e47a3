/**
 * The cautions on every plan page (README, "Sign-off and exports"; docs/model.md): the schedule is decision
 * support, to be checked against the interconnection agreement, grid code and
 * system operator, the battery maker's limits and the site's fire and safety
 * requirements; plus this plan's settings outside common practice.
 */
import { SIGN_OFF_CAUTIONS } from '@shared/schemas/sign-off';

export function Cautions({ warnings }: { warnings: readonly string[] }) {
  return (
    <section
      aria-labelledby="cautions-heading"
      className="rounded-lg border border-amber-500 bg-amber-100 p-4 text-sm text-ink-900"
    >
      <h2 id="cautions-heading" className="font-semibold text-ink-900">
        Cautions
      </h2>
      <ul className="mt-2 list-disc space-y-1 pl-5">
        {SIGN_OFF_CAUTIONS.map((text) => (
          <li key={text}>{text}</li>
        ))}
      </ul>
      {warnings.length > 0 && (
        <>
          <h3 className="mt-3 font-semibold text-amber-700">Settings outside common practice</h3>
          <ul className="mt-1 list-disc space-y-1 pl-5">
            {warnings.map((text) => (
              <li key={text}>{text}</li>
            ))}
          </ul>
        </>
      )}
    </section>
  );
}
