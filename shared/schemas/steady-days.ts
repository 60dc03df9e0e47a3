/** Steady-cycle days (docs/model.md), a choice of plans and horizon studies alike. */
import { z } from 'zod';

/**
 * Which local days the steady cycle averages (docs/model.md): every day, or only
 * weekdays (Mon–Fri) or weekend days (Sat–Sun), when the two price shapes differ.
 */
export const steadyDaysValues = ['all', 'weekday', 'weekend'] as const;
export type SteadyDays = (typeof steadyDaysValues)[number];
export const steadyDaysSchema = z.enum(steadyDaysValues, {
  error: 'Choose which days the steady cycle averages: all, weekday or weekend.',
});
export const steadyDaysLabels: Record<SteadyDays, string> = {
  all: 'every day',
  weekday: 'weekdays (Mon–Fri)',
  weekend: 'weekend days (Sat–Sun)',
};
