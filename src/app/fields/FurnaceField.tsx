/** The furnace a calculation is for: one choice shared by the calculators, shown once a furnace has a calibration. */
import type { DiffusivityModelId } from '../../physics';
import { calibrations, calibrationState, chosenFurnace } from '../settings/calibration';
import { calibrationWords } from './calibrationWords';
import { ChoiceField } from '../ui/ChoiceField';
import type { ScreenContext } from '../settings/screenContext';

export function FurnaceField({
  id,
  model,
  ctx,
  more = [],
}: {
  id: string;
  model: DiffusivityModelId;
  ctx: ScreenContext;
  /** Furnaces with other figures of their own (a learnt threshold, on the cycle and planner screens). */
  more?: readonly string[];
}) {
  const { t, show } = ctx;
  const list = calibrations.value;
  const furnace = chosenFurnace.value;
  const names = [...new Set([...list.map((c) => c.furnace), ...more])].sort();
  if (names.length === 0 && furnace === '') return null;
  const choices = [
    { value: '', label: t('app.calibration.noFurnace') },
    ...(furnace !== '' && !names.includes(furnace) ? [furnace] : [])
      .concat(names)
      .map((name) => ({ value: name, label: name })),
  ];
  const hint =
    calibrationWords(calibrationState(list, furnace, model), t, show)?.sentence ?? t('app.calibration.chooseHint');
  return (
    <ChoiceField
      wrap
      id={id}
      label={t('app.calibration.furnace')}
      value={furnace}
      choices={choices}
      onChange={(v) => (chosenFurnace.value = v)}
      hint={hint}
    />
  );
}
