/** One planned step (boost or diffuse): temperature, carbon potential and β (empty: the settings' default). */
import type { InputError } from '../../physics';
import { UNIT_SYMBOLS } from '../ui/format';
import { NumberField } from '../ui/NumberField';
import type { ScreenContext } from '../settings/screenContext';
import type { PotentialStepForm } from './state';

export interface StepFieldsProps {
  name: 'boost' | 'diffuse';
  step: PotentialStepForm;
  onChange: (next: PotentialStepForm) => void;
  errors: Record<string, InputError>;
  betaPlaceholder: string;
  ctx: ScreenContext;
}

export function StepFields({ name, step, onChange, errors, betaPlaceholder, ctx }: StepFieldsProps) {
  const { t, units, word } = ctx;
  const id = `plan-${name}`;
  const err = (field: string) => word(errors[`${name}.${field}`]);
  return (
    <fieldset class="plan-group plan-step">
      <legend>{t(`app.plan.steps.${name}`)}</legend>
      <div class="field-grid">
        <NumberField
          id={`${id}-temperature`}
          label={t('app.fields.temperature')}
          unit={units.temperature}
          value={step.temperature}
          onInput={(v) => onChange({ ...step, temperature: v })}
          error={err('temperatureC')}
        />
        <NumberField
          id={`${id}-cp`}
          label={t('app.plan.potential')}
          unitLabel={UNIT_SYMBOLS.pctC}
          value={step.carbonPotential}
          onInput={(v) => onChange({ ...step, carbonPotential: v })}
          error={err('carbonPotentialPct')}
        />
        <NumberField
          id={`${id}-beta`}
          label={t('app.cycle.beta')}
          unitLabel={UNIT_SYMBOLS.beta7}
          value={step.beta}
          placeholder={betaPlaceholder}
          onInput={(v) => onChange({ ...step, beta: v })}
          error={err('betaMPerS')}
        />
      </div>
    </fieldset>
  );
}
