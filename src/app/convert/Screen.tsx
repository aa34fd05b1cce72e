/** Unit conversions for the shop floor: temperature, length, time, diffusivity and (approximate) hardness. */
import { ChoiceField } from '../ui/ChoiceField';
import { UNIT_SYMBOLS } from '../ui/format';
import { NumberField } from '../ui/NumberField';
import { patch } from '../ui/persist';
import { ResultList, type ResultRow } from '../ui/ResultList';
import { Segmented } from '../ui/Segmented';
import { useScreenContext } from '../settings/screenContext';
import { conversionOutcome, formatConverted } from './results';
import { CONVERT_QUANTITIES, CONVERT_UNITS, convertForm, quantityOfForm, unitOfForm } from './state';
import './screen.css';

export default function ConvertScreen() {
  const { t, locale, word } = useScreenContext();
  const form = convertForm.value;
  const quantity = quantityOfForm(form);
  const from = unitOfForm(form, quantity);
  const outcome = conversionOutcome.value;
  const result = outcome.result;
  const rows: ResultRow[] = result
    ? Object.entries(result.values).map(([unit, value]) => ({
        key: unit,
        label: t(`app.convert.unitNames.${unit.replace('/', '_')}`),
        value: formatConverted(value, unit, locale),
        main: unit === from,
      }))
    : [];
  return (
    <div class="screen convert">
      <h1 tabIndex={-1}>{t('app.convert.title')}</h1>
      <ChoiceField
        id="convert-quantity"
        label={t('app.convert.quantity')}
        value={quantity}
        choices={CONVERT_QUANTITIES.map((q) => ({ value: q, label: t(`app.convert.quantities.${q}`) }))}
        onChange={(v) => patch(convertForm, { quantity: v })}
      />
      <section class="card" aria-labelledby="convert-input">
        <h2 id="convert-input">{t('app.common.inputs')}</h2>
        <Segmented
          name="convert-from"
          legend={t('app.convert.from')}
          value={from}
          choices={CONVERT_UNITS[quantity].map((u) => ({ value: u, label: UNIT_SYMBOLS[u] ?? u }))}
          onChange={(v) => patch(convertForm, { from: { ...form.from, [quantity]: v } })}
        />
        <NumberField
          id="convert-value"
          label={t('app.convert.value')}
          unitLabel={UNIT_SYMBOLS[from] ?? from}
          value={form.value[quantity]}
          onInput={(v) => patch(convertForm, { value: { ...form.value, [quantity]: v } })}
          error={word(outcome.errors.value)}
        />
      </section>
      <section class="card" aria-labelledby="convert-results">
        <h2 id="convert-results">{t('app.common.results')}</h2>
        {result && <ResultList rows={rows} label={t('app.common.results')} />}
        {quantity === 'hardness' && <p class="caution-line">{t('app.convert.hardnessApproximate')}</p>}
        {quantity === 'temperature' && <p class="note">{t('app.convert.temperatureNote')}</p>}
      </section>
    </div>
  );
}
