/** Public surface of the profile CSV reader, shared by the upload route and the browser preview. */
export {
  parseProfileCsv,
  type ParseProfileOptions,
  type ParseProfileResult,
  type ParsedProfile,
  type ProfileIssue,
} from './parse-profile-csv';
export { decodeProfileBytes } from './decode-profile-bytes';
export type { DateOrder } from './parse-timestamp';
export type { DecimalSeparator } from './parse-decimal';
export { SUPPORTED_STEPS_MINUTES } from './check-sequence';
export { DEFAULT_MAX_ISSUES } from './issue-list';
export {
  ACCEPTED_UNITS,
  ALL_PROFILE_KINDS,
  AVAILABILITY_UNITS,
  CANONICAL_UNIT,
  LIMIT_ACCEPTED_UNITS,
  LIMIT_CANONICAL_UNIT,
  LIMIT_PROFILE_KINDS,
  PRICE_UNITS,
  PROFILE_KINDS,
  QUANTITY_UNITS,
  RESERVE_PRICE_UNITS,
  VALUE_RANGE,
  canonicalFactor,
  canonicalUnitOf,
  isAcceptedUnit,
  unitsFor,
  isEnergyPerInterval,
  type AnyProfileKind,
  type LimitProfileKind,
  type ProfileKind,
  type ProfileUnit,
} from './profile-units';
export { acceptedUnitsFor, resolveProfileUnit, type UnitResolution } from './price-units';
export { createZoneClock, formatInstant, formatOffset, type ZoneClock } from './zone-clock';
