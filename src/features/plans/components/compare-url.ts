import type { Plan } from '@shared/schemas/plan';

/** The comparison page of a plan's delivery window. */
export const compareUrl = (plan: Pick<Plan, 'batteryId' | 'deliveryStart' | 'deliveryEnd'>) =>
  `/plans/compare?${new URLSearchParams({ batteryId: plan.batteryId, deliveryStart: plan.deliveryStart, deliveryEnd: plan.deliveryEnd }).toString()}`;
