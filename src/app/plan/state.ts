/** The planner's form: steel, model, shape, the boost and diffuse steps, an optional hardening soak and the drawing's targets, persisted as typed. */
import { field, type FieldText } from '../ui/fieldText';
import { persisted } from '../ui/persist';
import { defaultSteel, type SteelForm } from '../fields/steel';

/** A step at one temperature and carbon potential; β empty: the default from the settings. */
export interface PotentialStepForm {
  temperature: FieldText;
  carbonPotential: FieldText;
  /** In 10⁻⁷ m/s. */
  beta: FieldText;
}

export interface PlanForm {
  steel: SteelForm;
  model: string;
  /** Empty: the default from the settings. */
  threshold: FieldText;
  shape: string;
  size: FieldText;
  boost: PotentialStepForm;
  diffuse: PotentialStepForm;
  /** A soak at hardening temperature before the quench, at the diffuse potential. */
  hardening: boolean;
  hardeningTemp: FieldText;
  hardeningTime: FieldText;
  ecdMin: FieldText;
  ecdMax: FieldText;
  surfaceMin: FieldText;
  surfaceMax: FieldText;
}

const potentialStep = (tempC: string, cp: string): PotentialStepForm => ({
  temperature: field(tempC, 'C'),
  carbonPotential: field(cp),
  beta: field(''),
});

/** A first request to plan: SAE 8620 for a typical 0.75–1.00 mm ECD at 550 HV and 0.75–0.90 %C surface (no shop's drawing). */
export const DEFAULT_PLAN_FORM: PlanForm = {
  steel: defaultSteel('sae-8620'),
  model: '',
  threshold: field(''),
  shape: 'semi-infinite',
  size: field('20', 'mm'),
  boost: potentialStep('925', '1.1'),
  diffuse: potentialStep('925', '0.8'),
  hardening: true,
  hardeningTemp: field('850', 'C'),
  hardeningTime: field('0.5', 'h'),
  ecdMin: field('0.75', 'mm'),
  ecdMax: field('1', 'mm'),
  surfaceMin: field('0.75'),
  surfaceMax: field('0.9'),
};

export const planForm = persisted<PlanForm>('form.plan', DEFAULT_PLAN_FORM);
