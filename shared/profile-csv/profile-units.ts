/**
 * Units accepted at profile upload and how each converts to the canonical unit
 * the engine works in (prices in currency/MWh, power in kW).
 * Plain data with no zod so the browser preview and the server share it cheaply.
 */

/** Kinds a site's profile upload takes today (the profiles table's kinds). */
export type ProfileKind = 'price' | 'load' | 'generation';

export const PROFILE_KINDS = ['price', 'load', 'generation'] as const satisfies readonly ProfileKind[];

/**
 * Kinds of the operating limits (DESIGN section 4): availability as a fraction
 * 0–1 of the power ratings, reserve availability prices in currency/MW/h. The
 * reader and the engine's command line take them; uploads will once the
 * profiles table does.
 */
export type LimitProfileKind = 'availability' | 'reserve-up-price' | 'reserve-down-price';

export const LIMIT_PROFILE_KINDS = [
  'availability',
  'reserve-up-price',
  'reserve-down-price',
] as const satisfies readonly LimitProfileKind[];

/** Every kind the profile reader understands. */
export type AnyProfileKind = ProfileKind | LimitProfileKind;

export const ALL_PROFILE_KINDS = [...PROFILE_KINDS, ...LIMIT_PROFILE_KINDS] as const satisfies readonly AnyProfileKind[];

export const PRICE_UNITS = ['currency/MWh', 'currency/kWh'] as const;
/** Power (kW, MW) or energy per interval (kWh, MWh), converted by the step length. */
export const QUANTITY_UNITS = ['kW', 'MW', 'kWh', 'MWh'] as const;

/** Availability as a fraction (0–1) or a percentage (0–100) of the power ratings. */
export const AVAILABILITY_UNITS = ['fraction', '%'] as const;
/** Reserve availability prices per MW (or kW) held for one hour. */
export const RESERVE_PRICE_UNITS = ['currency/MW/h', 'currency/kW/h'] as const;

export type PriceUnit = (typeof PRICE_UNITS)[number];
export type QuantityUnit = (typeof QUANTITY_UNITS)[number];
export type AvailabilityUnit = (typeof AVAILABILITY_UNITS)[number];
export type ReservePriceUnit = (typeof RESERVE_PRICE_UNITS)[number];
export type ProfileUnit = PriceUnit | QuantityUnit | AvailabilityUnit | ReservePriceUnit;

/** Units of the upload kinds. */
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

/** Units of the operating-limit kinds. */
export const LIMIT_ACCEPTED_UNITS: Readonly<Record<LimitProfileKind, readonly ProfileUnit[]>> = {
  availability: AVAILABILITY_UNITS,
  'reserve-up-price': RESERVE_PRICE_UNITS,
  'reserve-down-price': RESERVE_PRICE_UNITS,
};

export const LIMIT_CANONICAL_UNIT: Readonly<Record<LimitProfileKind, ProfileUnit>> = {
  availability: 'fraction',
  'reserve-up-price': 'currency/MW/h',
  'reserve-down-price': 'currency/MW/h',
};

const isLimitKind = (kind: AnyProfileKind): kind is LimitProfileKind => kind in LIMIT_ACCEPTED_UNITS;

/** The units a profile of any kind may be given in. */
export function unitsFor(kind: AnyProfileKind): readonly ProfileUnit[] {
  return isLimitKind(kind) ? LIMIT_ACCEPTED_UNITS[kind] : ACCEPTED_UNITS[kind];
}

/** The unit the engine works in for a profile of any kind. */
export function canonicalUnitOf(kind: AnyProfileKind): ProfileUnit {
  return isLimitKind(kind) ? LIMIT_CANONICAL_UNIT[kind] : CANONICAL_UNIT[kind];
}

/** The range every value of a kind must lie in, in its canonical unit (null = any finite number). */
export const VALUE_RANGE: Readonly<Record<AnyProfileKind, readonly [number, number] | null>> = {
  price: null,
  load: null,
  generation: null,
  availability: [0, 1],
  'reserve-up-price': null,
  'reserve-down-price': null,
};

export function isAcceptedUnit(kind: AnyProfileKind, unit: string): unit is ProfileUnit {
  return (unitsFor(kind) as readonly string[]).includes(unit);
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
    case 'fraction':
    case 'currency/MW/h':
      return 1;
    case 'currency/kWh':
    case 'MW':
    case 'currency/kW/h':
      return 1000;
    case '%':
      return 0.01;
    case 'kWh':
      return 1 / stepHours;
    case 'MWh':
      return 1000 / stepHours;
  }
}
