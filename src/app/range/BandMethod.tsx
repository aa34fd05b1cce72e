/** "How this range is worked out": the method of the likely range in plain words, one tap away. */
import { useT } from '../../i18n/useT';
import { defaults } from '../settings/state';
import { UNIT_SYMBOLS } from '../ui/format';
import type { Show } from '../ui/show';
import './range.css';

/** β is shown in the unit it is typed in (10⁻⁷ m/s). */
const BETA_SHOWN = 1e-7;

export function BandMethod({ show, withBeta }: { show: Show; withBeta: boolean }) {
  const t = useT();
  const { temperatureToleranceC, betaRangeMPerS } = defaults.value;
  const beta = `${show.number(betaRangeMPerS.min / BETA_SHOWN, 1)}–${show.number(betaRangeMPerS.max / BETA_SHOWN, 1)} ${UNIT_SYMBOLS.beta7}`;
  return (
    <details class="disclosure band-method">
      <summary>{t('app.band.methodTitle')}</summary>
      <p>{t('app.band.method', { tolerance: show.temperatureDifference(temperatureToleranceC) })}</p>
      {withBeta && <p>{t('app.band.methodBeta', { range: beta })}</p>}
      <p>{t('app.band.methodNote')}</p>
    </details>
  );
}
