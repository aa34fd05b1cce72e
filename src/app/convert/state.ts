/** The conversion form: a quantity, the unit typed in and the value. */
import { UNITS } from '../../physics';
import { field, type FieldText } from '../ui/fieldText';
import { persisted } from '../ui/persist';

export const CONVERT_QUANTITIES = ['temperature', 'length', 'time', 'diffusivity', 'hardness'] as const;
export type ConvertQuantity = (typeof CONVERT_QUANTITIES)[number];

export const CONVERT_UNITS: Record<ConvertQuantity, readonly string[]> = { ...UNITS, hardness: ['HRC', 'HV'] };

export interface ConvertForm {
  quantity: string;
  /** The unit last chosen for each quantity. */
  from: Record<ConvertQuantity, string>;
  /** The value typed for each quantity (plain text: the unit is `from`). */
  value: Record<ConvertQuantity, FieldText>;
}

export const DEFAULT_CONVERT_FORM: ConvertForm = {
  quantity: 'temperature',
  from: { temperature: 'F', length: 'in', time: 'h', diffusivity: 'm2/s', hardness: 'HRC' },
  value: {
    temperature: field('1700'),
    length: field('0.035'),
    time: field('6'),
    diffusivity: field('1.5e-11'),
    hardness: field('58'),
  },
};

export const convertForm = persisted<ConvertForm>('form.convert', DEFAULT_CONVERT_FORM);

export function quantityOfForm(form: ConvertForm): ConvertQuantity {
  return (CONVERT_QUANTITIES as readonly string[]).includes(form.quantity)
    ? (form.quantity as ConvertQuantity)
    : 'temperature';
}

export function unitOfForm(form: ConvertForm, quantity: ConvertQuantity): string {
  const unit = form.from[quantity];
  return CONVERT_UNITS[quantity].includes(unit) ? unit : CONVERT_UNITS[quantity][0]!;
}
