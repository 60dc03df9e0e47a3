import { useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { buttonClass } from '@/components/form-field';
import { useCan } from '@/lib/authorization';
import { useCreateSite } from '@/features/sites/api/create-site';
import { SiteForm } from '@/features/sites/components/site-form';
import { SitesList } from '@/features/sites/components/sites-list';

export function SitesRoute() {
  const canEdit = useCan('data.edit');
  const [creating, setCreating] = useState(false);
  const create = useCreateSite();
  const navigate = useNavigate();
  return (
    <section className="space-y-4">
      <div className="flex items-center justify-between gap-4">
        <h1 className="text-2xl font-semibold">Sites</h1>
        {canEdit && !creating && (
          <button type="button" className={buttonClass.primary} onClick={() => setCreating(true)}>
            New site
          </button>
        )}
      </div>
      {creating && (
        <div className="rounded bg-white p-4 shadow-sm">
          <h2 className="mb-3 text-lg font-semibold">New site</h2>
          <SiteForm
            pending={create.isPending}
            serverError={create.error}
            onSubmit={(fields) => create.mutate(fields, { onSuccess: (site) => void navigate(`/sites/${site.id}`) })}
            onCancel={() => setCreating(false)}
          />
        </div>
      )}
      <SitesList />
    </section>
  );
}
