import { useState } from 'react';
import { Link, useParams } from 'react-router-dom';
import type { BatteryFields } from '@shared/schemas/battery';
import { buttonClass } from '@/components/form-field';
import { ErrorState, LoadingState } from '@/components/query-state';
import { ApiError } from '@/lib/api-client';
import { useCan } from '@/lib/authorization';
import { useSite } from '@/features/sites/api/get-site';
import { useBattery } from '@/features/batteries/api/get-battery';
import { useUpdateBattery } from '@/features/batteries/api/update-battery';
import { BatteryDetails } from '@/features/batteries/components/battery-details';
import { BatteryForm } from '@/features/batteries/components/battery-form';
import { formatMoment } from '@/lib/format';

export function BatteryRoute() {
  const { id = '' } = useParams();
  const battery = useBattery(id);
  const site = useSite(battery.data?.siteId ?? '');
  const canEdit = useCan('data.edit');
  const [editing, setEditing] = useState(false);
  const update = useUpdateBattery();

  if (battery.isPending || (battery.isSuccess && site.isPending)) return <LoadingState label="Loading the battery…" />;
  if (battery.isError) return <ErrorState error={battery.error} onRetry={() => void battery.refetch()} />;
  if (site.isError) return <ErrorState error={site.error} onRetry={() => void site.refetch()} />;
  const b = battery.data;
  const s = site.data;
  if (!s) return <LoadingState />;

  const save = (fields: BatteryFields) => {
    const patch = Object.fromEntries(Object.entries(fields).filter(([key, value]) => b[key as keyof BatteryFields] !== value));
    if (Object.keys(patch).length === 0) return setEditing(false);
    update.mutate({ id: b.id, patch: { ...patch, version: b.version } }, { onSuccess: () => setEditing(false) });
  };
  const stale = update.error instanceof ApiError && update.error.status === 409;

  return (
    <section className="space-y-4">
      <p className="text-sm">
        <Link to="/sites" className="text-seaglass-700 underline">
          Sites
        </Link>{' '}
        ›{' '}
        <Link to={`/sites/${s.id}`} className="text-seaglass-700 underline">
          {s.name}
        </Link>{' '}
        ›
      </p>
      <div className="flex items-center justify-between gap-4">
        <h1 className="text-2xl font-semibold">{b.name}</h1>
        {canEdit && !editing && (
          <button type="button" className={buttonClass.secondary} onClick={() => setEditing(true)}>
            Edit battery
          </button>
        )}
      </div>
      {stale && (
        <div role="alert" className="rounded border border-amber-500 bg-amber-100 p-3">
          <p>{update.error?.message}</p>
          <button
            type="button"
            className={`${buttonClass.secondary} mt-2`}
            onClick={() => {
              update.reset();
              void battery.refetch();
              setEditing(false);
            }}
          >
            Load the current values
          </button>
        </div>
      )}
      {editing ? (
        <BatteryForm
          key={b.version}
          battery={b}
          site={s}
          pending={update.isPending}
          serverError={stale ? undefined : update.error}
          onSubmit={save}
          onCancel={() => setEditing(false)}
        />
      ) : (
        <BatteryDetails battery={b} currency={s.currency} />
      )}
      <p className="text-xs text-ink-500">
        Version {b.version} · last changed {formatMoment(b.updatedAt)}
      </p>
    </section>
  );
}
