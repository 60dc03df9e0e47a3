/** Reading numbers in a stated format: one rule for form fields and uploads. */
export {
  numberFormatExample,
  parseDecimal,
  plainNumberText,
  type DecimalOptions,
  type DecimalReading,
  type DecimalSeparator,
} from './parse-decimal';
