import { useSearchParams } from 'react-router-dom';
import { useCan } from '@/lib/authorization';
import { NotForRole } from '@/components/not-for-role';
import { StudyForm } from './study-form';

export function NewStudyPage() {
  const [params] = useSearchParams();
  const canEdit = useCan('data.edit');
  if (!canEdit)
    return (
      <NotForRole title="New horizon study">Your role can read horizon studies but not start them; ask a planner.</NotForRole>
    );
  return (
    <section className="max-w-4xl space-y-4">
      <h1 className="text-2xl font-semibold text-ink-900">New horizon study</h1>
      <p className="text-ink-700">
        Replays the period with receding-horizon plans for each horizon and terminal rule, re-planning at the interval you choose,
        and compares each with the best plan over the whole period (the reference path). The result recommends the shortest
        horizon that is good enough.
      </p>
      <StudyForm initial={{ siteId: params.get('siteId') ?? '', batteryId: params.get('batteryId') ?? '' }} />
    </section>
  );
}
