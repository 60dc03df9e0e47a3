import type { PlanStatus } from '@shared/schemas/sign-off';

const LOOK: Record<PlanStatus, { label: string; className: string }> = {
  draft: { label: 'Draft: not approved', className: 'bg-ink-100 text-ink-800' },
  submitted: { label: 'Submitted: awaiting sign-off', className: 'bg-amber-100 text-ink-900' },
  approved: { label: 'Approved', className: 'bg-seaglass-100 text-seaglass-700' },
  rejected: { label: 'Rejected', className: 'bg-amber-100 text-amber-700' },
  superseded: { label: 'Superseded: not current', className: 'bg-ink-100 text-ink-500' },
};

export function PlanStatusBadge({ status }: { status: PlanStatus }) {
  const look = LOOK[status];
  return <span className={`inline-block rounded px-2 py-0.5 text-sm font-semibold ${look.className}`}>{look.label}</span>;
}
