/** The ECD threshold carbon of a form; empty means the default from the settings (shown as the placeholder). */
import { useT } from '../../i18n/useT';
import { defaults } from '../settings/state';
import type { FieldText } from '../ui/fieldText';
import { UNIT_SYMBOLS } from '../ui/format';
import { NumberField } from '../ui/NumberField';
import type { Show } from '../ui/show';

export interface ThresholdFieldProps {
  id: string;
  value: FieldText;
  onInput: (next: FieldText) => void;
  error: string | undefined;
  show: Show;
}

export function ThresholdField({ id, value, onInput, error, show }: ThresholdFieldProps) {
  const t = useT();
  return (
    <NumberField
      id={id}
      label={t('app.fields.threshold')}
      unitLabel={UNIT_SYMBOLS.pctC}
      value={value}
      placeholder={show.number(defaults.value.ecdThresholdPct, 2)}
      hint={t('app.fields.thresholdHint')}
      onInput={onInput}
      error={error}
    />
  );
}
