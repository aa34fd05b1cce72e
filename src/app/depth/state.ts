/** The case-depth form: what is solved for and every input, persisted as typed. */
import { field, type FieldText } from '../ui/fieldText';
import { persisted } from '../ui/persist';
import { defaultSteel, type SteelForm } from '../fields/steel';

export const SOLVE_FOR = ['depth', 'time', 'temperature'] as const;
export type SolveFor = (typeof SOLVE_FOR)[number];

export const CARBON_SOURCES = ['potential', 'surface'] as const;
export type CarbonSource = (typeof CARBON_SOURCES)[number];

export interface DepthForm {
  solveFor: string;
  temperature: FieldText;
  time: FieldText;
  targetDepth: FieldText;
  carbonSource: string;
  carbon: FieldText;
  steel: SteelForm;
  /** Empty: the default from the settings. */
  threshold: FieldText;
}

/** A first form to read: SAE 8620 at 925 °C for 6 h, a common start for about 0.9 mm ECD (no shop's part). */
export const DEFAULT_DEPTH_FORM: DepthForm = {
  solveFor: 'depth',
  temperature: field('925', 'C'),
  time: field('6', 'h'),
  targetDepth: field('0.9', 'mm'),
  carbonSource: 'potential',
  carbon: field('0.9'),
  steel: defaultSteel('sae-8620'),
  threshold: field(''),
};

export const depthForm = persisted<DepthForm>('form.depth', DEFAULT_DEPTH_FORM);
