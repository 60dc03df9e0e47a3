/** How profiles describe their step and unit (times and numbers: src/lib/format.ts). */
export function describeStep(minutes: number): string {
  return minutes % 60 === 0 ? `${minutes / 60} h` : `${minutes} min`;
}

/** The unit as shown: prices in the site's currency. */
export const displayUnit = (unit: string, currency: string) => unit.replace('currency', currency);
