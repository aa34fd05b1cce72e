/**
 * The likely range of a cycle's ECD, worked out on demand: 23 simulations (models × furnace
 * temperature tolerance × β range) are too many to repeat on every keystroke unasked, so the
 * range is computed only while it is open, once per changed recipe, in the physics worker; the
 * last range stays, marked updating, until the new one arrives.
 */
import { useEffect, useMemo, useState } from 'preact/hooks';
import type { Recipe } from '../../physics';
import { defaults } from '../settings/state';
import type { ScreenContext } from '../settings/screenContext';
import { ResultList } from '../ui/ResultList';
import { latestRun } from '../worker/client';
import { bandRow } from './band';
import { BandMethod } from './BandMethod';

export interface CycleBandProps {
  id: string;
  /** The recipe as simulated, the furnace's calibration factor on D included. */
  recipe: Recipe | undefined;
  ctx: ScreenContext;
}

export function CycleBand({ id, recipe, ctx }: CycleBandProps) {
  const { t, show } = ctx;
  const [open, setOpen] = useState(false);
  const ranges = useMemo(() => latestRun('band'), []);
  const { temperatureToleranceC, betaRangeMPerS } = defaults.value;
  useEffect(() => {
    if (open && recipe) ranges.run({ recipe, options: { temperatureToleranceC, betaRangeMPerS } });
  }, [ranges, open, recipe, temperatureToleranceC, betaRangeMPerS]);
  const answer = ranges.answer.value;
  const band = answer && 'output' in answer ? answer.output : undefined;
  const updating = open && ranges.updating.value;
  return (
    <div class="cycle-band" id={id} data-updating={updating ? '' : undefined}>
      <button
        type="button"
        class="button button-wide"
        aria-expanded={open}
        aria-controls={`${id}-body`}
        disabled={!recipe}
        onClick={() => setOpen(!open)}
      >
        {open ? t('app.band.hide') : t('app.band.show')}
      </button>
      <div id={`${id}-body`} class="cycle-band-body" hidden={!open} aria-busy={updating ? 'true' : undefined}>
        {updating && <p class="updating-mark">{t('app.common.updating')}</p>}
        {band && <ResultList rows={[bandRow(band, t, show)]} label={t('app.band.label')} />}
        <BandMethod show={show} withBeta />
      </div>
    </div>
  );
}
