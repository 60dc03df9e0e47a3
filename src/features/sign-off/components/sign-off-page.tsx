import { PendingSignOffList } from './pending-sign-off-list';
import { SignOffCautions } from './sign-off-cautions';

/** `/sign-off`: the approver's in-app list of plans awaiting their sign-off. */
export function SignOffPage() {
  return (
    <section className="space-y-5">
      <div>
        <h1 className="text-2xl font-semibold text-ink-900">Awaiting my sign-off</h1>
        <p className="mt-1 max-w-3xl text-ink-700">
          Plans submitted by other people. Open one to read its schedule and history, then approve or reject it. You never sign
          off a plan you submitted yourself.
        </p>
      </div>
      <SignOffCautions />
      <PendingSignOffList />
    </section>
  );
}
