/** One recipe step: name, duration, start and end temperature (a ramp when they differ), carbon potential or none, β. */
import { type InputError, TEXT_LENGTH_LIMITS } from '../../physics';
import { Icon } from '../ui/Icon';
import { UNIT_SYMBOLS } from '../ui/format';
import { NumberField } from '../ui/NumberField';
import { CheckField, TextField } from '../ui/TextField';
import type { ScreenContext } from '../settings/screenContext';
import type { StepForm } from './state';

export interface StepCardProps {
  index: number;
  count: number;
  step: StepForm;
  errors: Record<string, InputError>;
  ctx: ScreenContext;
  betaPlaceholder: string;
  onChange: (changes: Partial<StepForm>) => void;
  onMove: (by: -1 | 1) => void;
  onDuplicate: () => void;
  onRemove: () => void;
  canAdd: boolean;
}

export function StepCard({
  index,
  count,
  step,
  errors,
  ctx,
  betaPlaceholder,
  onChange,
  onMove,
  onDuplicate,
  onRemove,
  canAdd,
}: StepCardProps) {
  const { t, units, word } = ctx;
  const n = index + 1;
  const id = `step-${step.key}`;
  const err = (name: string) => word(errors[`steps.${index}.${name}`]);
  const title = step.label.trim()
    ? t('app.cycle.stepTitleNamed', { n, label: step.label.trim() })
    : t('app.cycle.stepTitle', { n });
  return (
    <li class="step card" aria-labelledby={`${id}-title`}>
      <div class="step-head">
        <h3 id={`${id}-title`}>{title}</h3>
        <div class="step-actions">
          <button
            type="button"
            class="button icon-button"
            aria-label={t('app.cycle.moveUp', { n })}
            disabled={index === 0}
            onClick={() => onMove(-1)}
          >
            <Icon name="up" />
          </button>
          <button
            type="button"
            class="button icon-button"
            aria-label={t('app.cycle.moveDown', { n })}
            disabled={index === count - 1}
            onClick={() => onMove(1)}
          >
            <Icon name="down" />
          </button>
          <button
            type="button"
            class="button icon-button"
            aria-label={t('app.cycle.duplicate', { n })}
            disabled={!canAdd}
            onClick={onDuplicate}
          >
            <Icon name="copy" />
          </button>
          <button
            type="button"
            class="button icon-button"
            aria-label={t('app.cycle.remove', { n })}
            disabled={count <= 1}
            onClick={onRemove}
          >
            <Icon name="remove" />
          </button>
        </div>
      </div>
      <TextField
        id={`${id}-label`}
        label={t('app.cycle.stepName')}
        value={step.label}
        placeholder={t('app.cycle.stepNamePlaceholder')}
        maxLength={TEXT_LENGTH_LIMITS.label}
        onInput={(v) => onChange({ label: v })}
      />
      <div class="field-grid field-grid-3">
        <NumberField
          compact
          id={`${id}-duration`}
          label={t('app.cycle.duration')}
          unit={units.time}
          value={step.duration}
          onInput={(v) => onChange({ duration: v })}
          error={err('durationH')}
        />
        <NumberField
          compact
          id={`${id}-start`}
          label={t('app.cycle.startTemperature')}
          unit={units.temperature}
          value={step.startTemp}
          onInput={(v) => onChange({ startTemp: v })}
          error={err('startTempC')}
        />
        <NumberField
          compact
          id={`${id}-end`}
          label={t('app.cycle.endTemperature')}
          unit={units.temperature}
          value={step.endTemp}
          onInput={(v) => onChange({ endTemp: v })}
          error={err('endTempC')}
        />
      </div>
      <CheckField
        id={`${id}-neutral`}
        label={t('app.cycle.neutral')}
        checked={step.neutral}
        onChange={(v) => onChange({ neutral: v })}
      />
      {!step.neutral && (
        <div class="field-grid">
          <NumberField
            compact
            id={`${id}-cp`}
            label={t('app.fields.carbonPotential')}
            unitLabel={UNIT_SYMBOLS.pctC}
            value={step.carbonPotential}
            onInput={(v) => onChange({ carbonPotential: v })}
            error={err('carbonPotentialPct')}
          />
          <NumberField
            compact
            id={`${id}-beta`}
            label={t('app.cycle.beta')}
            unitLabel={UNIT_SYMBOLS.beta7}
            value={step.beta}
            placeholder={betaPlaceholder}
            onInput={(v) => onChange({ beta: v })}
            error={err('betaMPerS')}
          />
        </div>
      )}
    </li>
  );
}
