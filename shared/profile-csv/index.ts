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
  CANONICAL_UNIT,
  PRICE_UNITS,
  PROFILE_KINDS,
  QUANTITY_UNITS,
  canonicalFactor,
  isAcceptedUnit,
  isEnergyPerInterval,
  type ProfileKind,
  type ProfileUnit,
} from './profile-units';
export { createZoneClock, formatInstant, formatOffset, type ZoneClock } from './zone-clock';
