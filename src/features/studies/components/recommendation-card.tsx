/** The study's recommendation with its reason, and the button that makes it the site's default horizon. */
import type { Study } from '@shared/schemas/study';
import { buttonClass } from '@/components/form-field';
import { useRunSourceLists } from '@/components/run-source-fields';
import { useCan } from '@/lib/authorization';
import { useAdoptHorizon } from '../api/adopt-horizon';

export function RecommendationCard({ study }: { study: Study }) {
  const rec = study.results?.recommendation;
  const canEdit = useCan('data.edit');
  const adopt = useAdoptHorizon();
  const { sites } = useRunSourceLists('');
  const site = sites.data?.find((s) => s.id === study.siteId);
  if (!rec) return null;
  const hours = rec.horizonHours;
  // The site's default is a whole number of hours (1–8784): a fractional recommendation is rounded up,
  // since a longer horizon only adds lookahead.
  const adopted = hours === null ? null : Math.ceil(hours);
  const adoptable = adopted !== null && adopted >= 1 && adopted <= 8784;
  const rounded = adopted !== hours ? ` (${hours} h rounded up)` : '';
  const current = site?.defaultHorizonHours ?? null;
  return (
    <section
      aria-labelledby="recommendation-heading"
      className="space-y-2 rounded-lg border-l-4 border-seaglass-600 bg-seaglass-100 p-4"
    >
      <h2 id="recommendation-heading" className="text-lg font-semibold text-ink-900">
        {hours === null ? 'No recommendation' : `Recommended: ${hours} h with the ${rec.terminal} terminal rule`}
      </h2>
      <p className="text-ink-800">Why: {rec.reason}.</p>
      {canEdit && adoptable && (
        <div className="flex flex-wrap items-center gap-3">
          <button
            type="button"
            className={buttonClass.primary}
            disabled={adopt.isPending || current === adopted}
            onClick={() => adopt.mutate({ siteId: study.siteId, hours: adopted })}
          >
            {current === adopted
              ? `${adopted} h is the default at ${study.siteName}`
              : `Make ${adopted} h${rounded} the default for new plans at ${study.siteName}`}
          </button>
          {current !== null && current !== adopted && <span className="text-sm text-ink-700">Now: {current} h.</span>}
          {adopt.isError && (
            <span role="alert" className="text-sm text-brick-700">
              {adopt.error.message}
            </span>
          )}
          {adopt.isSuccess && (
            <span role="status" className="text-sm text-seaglass-700">
              Saved: new plans at this site start with {adopted} h.
            </span>
          )}
        </div>
      )}
    </section>
  );
}
