/**
 * The likely range of a cycle's ECD, worked out on demand: 23 simulations (models × furnace
 * temperature tolerance × β range) are too many to repeat on every keystroke unasked, so the
 * range is computed only while it is open, once per changed recipe.
 */
import { useMemo, useState } from 'preact/hooks';
import { cycleDepthBand, type Recipe } from '../../physics';
import { defaults } from '../settings/state';
import { bandRow } from './band';
import { BandMethod } from './BandMethod';
import { ResultList } from '../ui/ResultList';
import type { ScreenContext } from '../settings/screenContext';
import { timed } from '../ui/timing';

export interface CycleBandProps {
  id: string;
  recipe: Recipe | undefined;
  /** The furnace's calibration factor on D used for the result. */
  diffusivityFactor: number;
  ctx: ScreenContext;
}

export function CycleBand({ id, recipe, diffusivityFactor, ctx }: CycleBandProps) {
  const { t, show } = ctx;
  const [open, setOpen] = useState(false);
  const { temperatureToleranceC, betaRangeMPerS } = defaults.value;
  const band = useMemo(
    () =>
      open && recipe
        ? timed('band', () => cycleDepthBand(recipe, { diffusivityFactor, temperatureToleranceC, betaRangeMPerS }))
        : undefined,
    [open, recipe, diffusivityFactor, temperatureToleranceC, betaRangeMPerS],
  );
  return (
    <div class="cycle-band" id={id}>
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
      <div id={`${id}-body`} class="cycle-band-body" hidden={!open}>
        {band && <ResultList rows={[bandRow(band, t, show)]} label={t('app.band.label')} />}
        <BandMethod show={show} withBeta />
      </div>
    </div>
  );
}
