/** The cycle editor's form: steps, part shape, steel, model and threshold, persisted as typed. */
import { MAX_STEPS } from '../../physics';
import { field, type FieldText } from '../ui/fieldText';
import { persisted } from '../ui/persist';
import { defaultSteel, type SteelForm } from '../fields/steel';

export interface StepForm {
  /** Stable key for the list (survives reordering). */
  key: number;
  label: string;
  duration: FieldText;
  startTemp: FieldText;
  endTemp: FieldText;
  /** No carbon transfer (neutral gas). */
  neutral: boolean;
  carbonPotential: FieldText;
  /** In 10⁻⁷ m/s; empty: the default from the settings. */
  beta: FieldText;
}

export interface CycleForm {
  steps: StepForm[];
  shape: string;
  /** Plate thickness or bar diameter. */
  size: FieldText;
  steel: SteelForm;
  model: string;
  /** Empty: the default from the settings. */
  threshold: FieldText;
  nextKey: number;
}

const step = (key: number, durationH: string, startC: string, endC: string, cp: string): StepForm => ({
  key,
  label: '',
  duration: field(durationH, 'h'),
  startTemp: field(startC, 'C'),
  endTemp: field(endC, 'C'),
  neutral: false,
  carbonPotential: field(cp),
  beta: field(''),
});

/** A first form to edit: a textbook boost and diffuse on SAE 8620 at 925 °C, then a drop to 845 °C to harden (no shop's recipe). */
export const DEFAULT_CYCLE_FORM: CycleForm = {
  steps: [
    step(1, '3.5', '925', '925', '1.1'),
    step(2, '2', '925', '925', '0.8'),
    step(3, '0.5', '925', '845', '0.8'),
    step(4, '0.5', '845', '845', '0.8'),
  ],
  shape: 'semi-infinite',
  size: field('20', 'mm'),
  steel: defaultSteel('sae-8620'),
  model: '',
  threshold: field(''),
  nextKey: 5,
};

export const cycleForm = persisted<CycleForm>('form.cycle', DEFAULT_CYCLE_FORM);

/** The steps a plan replaced, kept (across reloads) until the person brings them back or keeps the plan's. */
export const replacedCycle = persisted<{ form: CycleForm; active: boolean }>('form.cycleReplaced', {
  form: DEFAULT_CYCLE_FORM,
  active: false,
});

const sameForm = (a: CycleForm, b: CycleForm) => JSON.stringify(a) === JSON.stringify(b);

/** Puts `next` into the editor; what was there stays at hand for an undo, unless it was the same. */
export function replaceCycleForm(next: CycleForm): void {
  const current = cycleForm.peek();
  if (!sameForm(current, next)) replacedCycle.value = { form: current, active: true };
  cycleForm.value = next;
}

/** Brings back the steps a plan replaced. */
export function undoCycleReplace(): void {
  const { form, active } = replacedCycle.peek();
  if (!active) return;
  cycleForm.value = form;
  replacedCycle.value = { form: DEFAULT_CYCLE_FORM, active: false };
}

/** Keeps the plan's steps; the replaced ones are let go. */
export function keepCycleReplace(): void {
  replacedCycle.value = { form: DEFAULT_CYCLE_FORM, active: false };
}

/** The editor offers as many steps as a recipe may have. */
export { MAX_STEPS } from '../../physics';

export function addStep(form: CycleForm): CycleForm {
  if (form.steps.length >= MAX_STEPS) return form;
  const last = form.steps[form.steps.length - 1];
  const base = last
    ? { ...last, label: '', startTemp: last.endTemp, duration: { ...last.duration, text: '1' } }
    : step(0, '1', '925', '925', '0.8');
  return { ...form, steps: [...form.steps, { ...base, key: form.nextKey }], nextKey: form.nextKey + 1 };
}

export function duplicateStep(form: CycleForm, index: number): CycleForm {
  const original = form.steps[index];
  if (!original || form.steps.length >= MAX_STEPS) return form;
  const steps = [...form.steps];
  steps.splice(index + 1, 0, { ...original, key: form.nextKey });
  return { ...form, steps, nextKey: form.nextKey + 1 };
}

export function removeStep(form: CycleForm, index: number): CycleForm {
  return form.steps.length <= 1 ? form : { ...form, steps: form.steps.filter((_, i) => i !== index) };
}

export function moveStep(form: CycleForm, index: number, by: -1 | 1): CycleForm {
  const target = index + by;
  if (target < 0 || target >= form.steps.length) return form;
  const steps = [...form.steps];
  [steps[index], steps[target]] = [steps[target]!, steps[index]!];
  return { ...form, steps };
}

export function updateStep(form: CycleForm, index: number, changes: Partial<StepForm>): CycleForm {
  return { ...form, steps: form.steps.map((s, i) => (i === index ? { ...s, ...changes } : s)) };
}
