/** A calculation's own diffusivity model, or the one in the settings (the empty choice). */
import { MODEL_IDS } from '../../physics';
import { model } from '../settings/state';
import { ChoiceField } from '../ui/ChoiceField';
import { wellsBatzMehlNote } from './modelNotes';
import type { ScreenContext } from '../settings/screenContext';

export function ModelField({
  id,
  value,
  onChange,
  ctx,
}: {
  id: string;
  value: string;
  onChange: (value: string) => void;
  ctx: ScreenContext;
}) {
  const { t, show } = ctx;
  const inUse = value === '' ? model.value : value;
  const choices = [
    { value: '', label: t('app.cycle.modelFromSettings', { model: t(`app.models.${model.value}`) }) },
    ...MODEL_IDS.map((m) => ({ value: m, label: t(`app.models.${m}`) })),
  ];
  return (
    <ChoiceField
      id={id}
      label={t('app.settings.model')}
      value={value}
      choices={choices}
      onChange={onChange}
      hint={inUse === 'wells-batz-mehl' ? wellsBatzMehlNote(t, show) : undefined}
    />
  );
}
