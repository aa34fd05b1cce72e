/** The part's shape in a cycle form (cycle editor and planner): the kind, and a plate's thickness or a bar's diameter. */
import type { FieldText } from '../ui/fieldText';

export const SHAPES = ['semi-infinite', 'plate', 'bar'] as const;
export type ShapeKind = (typeof SHAPES)[number];

/** The shape laid out as the request's: a plate's thickness or a bar's diameter from the one size input. */
export function shapeValues(
  kind: string,
  size: FieldText,
): { kind: string; thicknessMm?: FieldText; diameterMm?: FieldText } {
  if (kind === 'plate') return { kind, thicknessMm: size };
  if (kind === 'bar') return { kind, diameterMm: size };
  return { kind: 'semi-infinite' };
}

/** The request path of the size input, for its error. */
export function sizePath(kind: string): string | undefined {
  if (kind === 'plate') return 'shape.thicknessMm';
  if (kind === 'bar') return 'shape.diameterMm';
  return undefined;
}
