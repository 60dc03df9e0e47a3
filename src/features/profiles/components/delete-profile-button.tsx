import type { ProfileSummary } from '@shared/schemas/profile';
import { buttonClass } from '@/components/form-field';
import { useDeleteProfile } from '../api/delete-profile';

/** Deletes after a confirmation; a refusal (409: a submitted or approved plan rests on it) is shown with its reason. */
export function DeleteProfileButton({ profile, onDeleted }: { profile: ProfileSummary; onDeleted: () => void }) {
  const remove = useDeleteProfile();
  const confirmAndDelete = () => {
    if (!window.confirm(`Delete the profile “${profile.name}”? Its values and original file are removed.`)) return;
    remove.mutate({ id: profile.id, siteId: profile.siteId }, { onSuccess: onDeleted });
  };
  return (
    <div className="flex flex-col gap-1">
      <button type="button" className={buttonClass.danger} onClick={confirmAndDelete} disabled={remove.isPending}>
        {remove.isPending ? 'Deleting…' : 'Delete profile'}
      </button>
      {remove.isError && (
        <p role="alert" className="max-w-xl text-sm text-brick-700">
          {remove.error.message}
        </p>
      )}
    </div>
  );
}
