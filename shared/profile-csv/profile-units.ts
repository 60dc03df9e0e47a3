/**
 * Units accepted at profile upload and how each converts to the canonical unit
 * the engine works in (prices in currency/MWh, power in kW).
 * Plain data with no zod so the browser preview and the server share it cheaply.
 */

export type ProfileKind = 'price' | 'load' | 'generation';

export const PROFILE_KINDS = ['price', 'load', 'generation'] as const satisfies readonly ProfileKind[];

export const PRICE_UNITS = ['currency/MWh', 'currency/kWh'] as const;
/** Power (kW, MW) or energy per interval (kWh, MWh), converted by the step length. */
export const QUANTITY_UNITS = ['kW', 'MW', 'kWh', 'MWh'] as const;

export type PriceUnit = (typeof PRICE_UNITS)[number];
export type QuantityUnit = (typeof QUANTITY_UNITS)[number];
export type ProfileUnit = PriceUnit | QuantityUnit;

export const ACCEPTED_UNITS: Readonly<Record<ProfileKind, readonly ProfileUnit[]>> = {
  price: PRICE_UNITS,
  load: QUANTITY_UNITS,
  generation: QUANTITY_UNITS,
};

export const CANONICAL_UNIT: Readonly<Record<ProfileKind, ProfileUnit>> = {
  price: 'currency/MWh',
  load: 'kW',
  generation: 'kW',
};

export function isAcceptedUnit(kind: ProfileKind, unit: string): unit is ProfileUnit {
  return (ACCEPTED_UNITS[kind] as readonly string[]).includes(unit);
}

/** True when the unit is an energy per interval, whose conversion depends on the step. */
export function isEnergyPerInterval(unit: ProfileUnit): boolean {
  return unit === 'kWh' || unit === 'MWh';
}

/**
 * Factor that turns a value in `unit` into the canonical unit of its kind.
 * Energy per interval becomes average power over the interval: kW = kWh / (step in hours).
 */
export function canonicalFactor(unit: ProfileUnit, stepMinutes: number): number {
  const stepHours = stepMinutes / 60;
  switch (unit) {
    case 'currency/MWh':
    case 'kW':
      return 1;
    case 'currency/kWh':
    case 'MW':
      return 1000;
    case 'kWh':
      return 1 / stepHours;
    case 'MWh':
      return 1000 / stepHours;
  }
}
