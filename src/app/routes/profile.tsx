import { Link, useNavigate, useParams } from 'react-router-dom';
import { ErrorState, LoadingState } from '@/components/query-state';
import { useCan } from '@/lib/authorization';
import { useSite } from '@/features/sites/api/get-site';
import { useProfile } from '@/features/profiles/api/get-profile';
import { ProfileDetail } from '@/features/profiles/components/profile-detail';

export function ProfileRoute() {
  const { id = '' } = useParams();
  // The whole-series query ProfileDetail starts with: its siteId says which zone and currency to show.
  const profile = useProfile(id);
  const site = useSite(profile.data?.siteId ?? '');
  const canEdit = useCan('data.edit');
  const navigate = useNavigate();

  if (profile.isPending || (profile.isSuccess && site.isPending)) return <LoadingState label="Loading the profile…" />;
  if (profile.isError) return <ErrorState error={profile.error} onRetry={() => void profile.refetch()} />;
  if (site.isError) return <ErrorState error={site.error} onRetry={() => void site.refetch()} />;
  const s = site.data;
  if (!s) return <LoadingState />;
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
      <h1 className="text-2xl font-semibold">{profile.data.name}</h1>
      <ProfileDetail
        id={id}
        timezone={s.timezone}
        currency={s.currency}
        canEdit={canEdit}
        onDeleted={() => void navigate(`/sites/${s.id}`)}
      />
    </section>
  );
}
