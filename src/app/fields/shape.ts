/** The part's shape in a cycle form (cycle editor and planner): the kind, and a plate's thickness or a bar's diameter. */
import { fail, type PartShape } from '../../physics';
import { readField, type FieldText } from '../ui/fieldText';
import type { FieldReader } from '../ui/outcome';
import { PHYSICS_UNITS } from '../ui/units';

export const SHAPES = ['semi-infinite', 'plate', 'bar'] as const;
export type ShapeKind = (typeof SHAPES)[number];

/** The shape to send to physics (size errors on the form field `size`); undefined when the size cannot be read. */
export function readShape(kind: string, size: FieldText, read: FieldReader): PartShape | undefined {
  if (kind !== 'plate' && kind !== 'bar') return { kind: 'semi-infinite' };
  const sizeMm = read.value(readField(size, 'size', PHYSICS_UNITS.depth));
  if (sizeMm === undefined) return undefined;
  if (!(sizeMm > 0)) {
    read.value(fail('depth.notPositive', 'size', { value: sizeMm }));
    return undefined;
  }
  return kind === 'plate' ? { kind: 'plate', thicknessMm: sizeMm } : { kind: 'bar', diameterMm: sizeMm };
}
