import { useState, type ReactNode } from 'react';
import { Link, useParams } from 'react-router-dom';
import { buttonClass } from '@/components/form-field';
import { ErrorState, LoadingState } from '@/components/query-state';
import { useCan } from '@/lib/authorization';
import { useSite } from '@/features/sites/api/get-site';
import { useUpdateSite } from '@/features/sites/api/update-site';
import { SiteForm } from '@/features/sites/components/site-form';
import { SiteSummary } from '@/features/sites/components/site-summary';
import { useCreateBattery } from '@/features/batteries/api/create-battery';
import { BatteriesList } from '@/features/batteries/components/batteries-list';
import { BatteryForm } from '@/features/batteries/components/battery-form';
import { ProfileUpload } from '@/features/profiles/components/profile-upload';
import { ProfilesList } from '@/features/profiles/components/profiles-list';

/** Open when the site has no profile yet; decided once, so it does not fold after the first upload. */
function UploadSection({ openAtFirst, children }: { openAtFirst: boolean; children: ReactNode }) {
  const [open] = useState(openAtFirst);
  return (
    <details className="rounded bg-white p-4 shadow-sm" open={open}>
      <summary className="cursor-pointer font-medium text-ink-800">Upload a profile</summary>
      <div className="mt-3">{children}</div>
    </details>
  );
}

/** One site: its settings, its batteries, its profiles (upload and list). */
export function SiteRoute() {
  const { id = '' } = useParams();
  const site = useSite(id);
  const canEdit = useCan('data.edit');
  const [editing, setEditing] = useState(false);
  const [addingBattery, setAddingBattery] = useState(false);
  const update = useUpdateSite();
  const createBattery = useCreateBattery();

  if (site.isPending) return <LoadingState label="Loading the site…" />;
  if (site.isError) return <ErrorState error={site.error} onRetry={() => void site.refetch()} />;
  const s = site.data;

  return (
    <div className="space-y-8">
      <section className="space-y-3">
        <p className="text-sm">
          <Link to="/sites" className="text-seaglass-700 underline">
            Sites
          </Link>{' '}
          ›
        </p>
        <div className="flex items-center justify-between gap-4">
          <h1 className="text-2xl font-semibold">{s.name}</h1>
          {canEdit && !editing && (
            <button type="button" className={buttonClass.secondary} onClick={() => setEditing(true)}>
              Edit site
            </button>
          )}
        </div>
        {editing ? (
          <div className="rounded bg-white p-4 shadow-sm">
            <SiteForm
              site={s}
              pending={update.isPending}
              serverError={update.error}
              onSubmit={(fields) => {
                const patch = Object.fromEntries(
                  Object.entries(fields).filter(([key, value]) => s[key as keyof typeof fields] !== value),
                );
                if (Object.keys(patch).length === 0) return setEditing(false);
                update.mutate({ id: s.id, patch }, { onSuccess: () => setEditing(false) });
              }}
              onCancel={() => setEditing(false)}
            />
          </div>
        ) : (
          <SiteSummary site={s} />
        )}
      </section>

      <section className="space-y-3" aria-labelledby="batteries-heading">
        <div className="flex items-center justify-between gap-4">
          <h2 id="batteries-heading" className="text-xl font-semibold">
            Batteries
          </h2>
          {canEdit && !addingBattery && (
            <button type="button" className={buttonClass.primary} onClick={() => setAddingBattery(true)}>
              Add battery
            </button>
          )}
        </div>
        {addingBattery && (
          <div className="rounded bg-ink-100 p-4">
            <BatteryForm
              site={s}
              pending={createBattery.isPending}
              serverError={createBattery.error}
              onSubmit={(fields) =>
                createBattery.mutate({ siteId: s.id, input: fields }, { onSuccess: () => setAddingBattery(false) })
              }
              onCancel={() => setAddingBattery(false)}
            />
          </div>
        )}
        <BatteriesList siteId={s.id} />
      </section>

      <section className="space-y-3" aria-labelledby="profiles-heading">
        <h2 id="profiles-heading" className="text-xl font-semibold">
          Profiles
        </h2>
        {canEdit && (
          <UploadSection openAtFirst={s.profileCount === 0}>
            <ProfileUpload siteId={s.id} timezone={s.timezone} currency={s.currency} />
          </UploadSection>
        )}
        <ProfilesList siteId={s.id} timezone={s.timezone} currency={s.currency} />
      </section>
    </div>
  );
}
