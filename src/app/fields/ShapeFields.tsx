/** Part shape and, for a plate or a bar, its size. */
import { ChoiceField } from '../ui/ChoiceField';
import type { FieldText } from '../ui/fieldText';
import { NumberField } from '../ui/NumberField';
import type { ScreenContext } from '../settings/screenContext';
import { SHAPES } from './shape';

export interface ShapeFieldsProps {
  idPrefix: string;
  shape: string;
  size: FieldText;
  onChange: (changes: { shape?: string; size?: FieldText }) => void;
  error: string | undefined;
  ctx: ScreenContext;
}

export function ShapeFields({ idPrefix, shape, size, onChange, error, ctx }: ShapeFieldsProps) {
  const { t, units } = ctx;
  return (
    <>
      <ChoiceField
        id={`${idPrefix}-shape`}
        label={t('app.cycle.shape')}
        value={shape}
        choices={SHAPES.map((s) => ({ value: s, label: t(`app.cycle.shapes.${s}`) }))}
        onChange={(v) => onChange({ shape: v })}
      />
      {(shape === 'plate' || shape === 'bar') && (
        <NumberField
          id={`${idPrefix}-size`}
          label={shape === 'plate' ? t('app.cycle.thickness') : t('app.cycle.diameter')}
          unit={units.depth}
          value={size}
          onInput={(v) => onChange({ size: v })}
          error={error}
        />
      )}
    </>
  );
}
