/**
 * The steel part of a form, shared by the depth and cycle screens: a listed grade
 * (nominal composition) or a custom composition, and core carbon.
 */
import { ALLOY_ELEMENTS, findGrade, type Composition } from '../../physics';
import { field, type FieldText } from '../ui/fieldText';

export const CUSTOM_STEEL = 'custom';

export interface SteelForm {
  /** A grade id from grades.ts, or CUSTOM_STEEL. */
  grade: string;
  coreCarbon: FieldText;
  composition: Record<(typeof ALLOY_ELEMENTS)[number], FieldText>;
}

export const defaultSteel = (gradeId: string): SteelForm => {
  const grade = findGrade(gradeId);
  return {
    grade: gradeId,
    coreCarbon: field(String(grade?.coreCarbonPct ?? 0.2)),
    composition: Object.fromEntries(
      ALLOY_ELEMENTS.map((e) => [e, field(String(grade?.composition[e] ?? 0))]),
    ) as SteelForm['composition'],
  };
};

/** Choosing a grade fills core carbon and composition with its nominal values; custom keeps what is there. */
export function chooseGrade(steel: SteelForm, gradeId: string): SteelForm {
  const grade = findGrade(gradeId);
  if (!grade) return { ...steel, grade: CUSTOM_STEEL };
  return { ...defaultSteel(gradeId), grade: gradeId };
}

/** The composition for a request: the grade's nominal one, or the custom entries as typed (read by the request's description). */
export function steelComposition(steel: SteelForm): Composition | SteelForm['composition'] {
  return findGrade(steel.grade)?.composition ?? steel.composition;
}
