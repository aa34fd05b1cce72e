/**
 * What the model choice says about the models, with the figures measured by physics: their spread
 * over the compared range, and the weak carbon dependence of the Wells–Batz–Mehl form.
 */
import type { TFunction } from 'i18next';
import {
  CARBON_DEPENDENCE_POINT,
  carbonDependence,
  MODEL_CALIBRATED_RANGE,
  modelSpread,
  type DiffusivityModelId,
} from '../../physics';
import type { Show } from '../ui/show';

let spread: ReturnType<typeof modelSpread> | undefined;
/** The spread is a property of the models, worked out once. */
const spreadOnce = () => (spread ??= modelSpread());

const pct = (show: Show, fraction: number) => `${fraction > 0 ? '+' : ''}${show.number(100 * fraction, 0)} %`;

/** The settings' hint under the model choice: the other models as a range, and how far they differ. */
export function modelSpreadHint(t: TFunction, show: Show): string {
  const { relativeToAgren, maxRatio } = spreadOnce();
  const r = MODEL_CALIBRATED_RANGE;
  const range = (id: DiffusivityModelId) =>
    `${pct(show, relativeToAgren[id].min)} … ${pct(show, relativeToAgren[id].max)}`;
  return t('app.settings.modelHint', {
    temperatures: show.temperatureRange(r.minTempC, r.maxTempC),
    carbon: show.carbonRange(r.minCarbonPct, r.maxCarbonPct),
    tibbetts: range('tibbetts'),
    wbm: range('wells-batz-mehl'),
    ratio: show.number(maxRatio, 1),
  });
}

/** Said wherever Wells–Batz–Mehl is the model in use: which form it is, and how little its D depends on carbon. */
export function wellsBatzMehlNote(t: TFunction, show: Show): string {
  const { tempC, lowPct, highPct } = CARBON_DEPENDENCE_POINT;
  return t('app.modelNotes.wellsBatzMehl', {
    low: show.carbon(lowPct),
    high: show.carbon(highPct),
    temperature: show.temperature(tempC),
    wbm: show.number(carbonDependence('wells-batz-mehl'), 1),
    agren: show.number(carbonDependence('agren'), 1),
    tibbetts: show.number(carbonDependence('tibbetts'), 1),
  });
}
