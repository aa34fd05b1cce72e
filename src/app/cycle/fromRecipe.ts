/**
 * A recipe (a planned cycle) as the cycle editor's form, so "open in the cycle editor" shows
 * exactly the planned steps: hours and °C as typed values (the fields show them in the user's
 * units), β left empty where it equals the settings' default.
 */
import type { Recipe } from '../../physics';
import { BETA_INPUT_SCALE } from '../settings/state';
import { field, type FieldText } from '../ui/fieldText';
import type { SteelForm } from '../fields/steel';
import type { CycleForm, StepForm } from './state';

export interface FormExtras {
  /** The steel as the planner's form holds it (grade id, or custom with its composition). */
  steel: SteelForm;
  /** The model and threshold fields as typed ('' follows the settings). */
  model: string;
  threshold: FieldText;
  /** Plate thickness or bar diameter as typed. */
  size: FieldText;
  /** β of the settings, m/s: a step with this β leaves its field empty. */
  defaultBetaMPerS: number;
  /** Step label words in the user's language, by the recipe's label. */
  labelOf: (label: string) => string;
}

/** A number as field text: up to 6 decimals, no float noise ("4.193", not "4.1930000000000005"). */
const text = (value: number) => String(Number(value.toFixed(6)));

export function cycleFormOfRecipe(recipe: Recipe, extras: FormExtras): CycleForm {
  const steps: StepForm[] = recipe.steps.map((step, i) => ({
    key: i + 1,
    label: step.label === undefined ? '' : extras.labelOf(step.label),
    duration: field(text(step.durationH), 'h'),
    startTemp: field(text(step.startTempC), 'C'),
    endTemp: field(text(step.endTempC), 'C'),
    neutral: step.carbonPotentialPct === null,
    carbonPotential: field(step.carbonPotentialPct === null ? '' : text(step.carbonPotentialPct)),
    beta: field(
      step.betaMPerS === undefined || step.betaMPerS === extras.defaultBetaMPerS
        ? ''
        : text(step.betaMPerS / BETA_INPUT_SCALE),
    ),
  }));
  return {
    steps,
    shape: recipe.shape?.kind ?? 'semi-infinite',
    size: extras.size,
    steel: extras.steel,
    model: extras.model,
    threshold: extras.threshold,
    nextKey: steps.length + 1,
  };
}
