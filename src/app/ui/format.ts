/** The app's door to the one number formatter (src/i18n/format.ts, shared with the CLI). */
export {
  decimalMark,
  formatHoursMinutes,
  formatInput,
  formatMessageNumber,
  formatMessageQuantity,
  formatNumber,
  formatQuantity,
  formatRange,
  formatScientific,
  localizeTyped,
  NO_VALUE,
  resultDigits,
  UNIT_SYMBOLS,
  unitSymbol,
  valueAsShown,
} from '../../i18n/format';
