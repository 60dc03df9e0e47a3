/**
 * Reading numbers in a stated format: one rule for form fields and uploads. The rule lives
 * beside the profile CSV reader (shared/profile-csv/parse-decimal.ts) because that reader,
 * which also runs in the browser's parsing worker, imports nothing outside its own folder.
 */
export {
  numberFormatExample,
  parseDecimal,
  plainNumberText,
  type DecimalOptions,
  type DecimalReading,
  type DecimalSeparator,
} from '../profile-csv/parse-decimal';
