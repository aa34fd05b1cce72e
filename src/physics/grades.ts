/**
 * The common carburizing grades with nominal compositions: the middle of each grade's specified
 * range (SAE J404 / EN 10084 ranges, recalled from memory; silicon, where the standard only caps
 * it, at a typical 0.25 % for killed steel, 0.20 % for plain carbon).
 * Nominal only: the app tells the user to use the mill certificate.
 * `typicalCoreHardnessHrc` is common practice, from memory: the core after quench depends on
 * the section and the quench, so the part master's or the lab's figure replaces it.
 */
import type { Composition } from './steel';

export interface SteelGrade {
  id: string;
  /** Grade designation as the trade writes it. */
  name: string;
  coreCarbonPct: number;
  composition: Composition;
  /** Typical core hardness of a carburized and quenched part, HRC (common practice, from memory). */
  typicalCoreHardnessHrc: number;
}

export const STEEL_GRADES: readonly SteelGrade[] = [
  {
    id: 'sae-1018',
    name: 'SAE 1018',
    coreCarbonPct: 0.18,
    composition: { Si: 0.2, Mn: 0.75, Cr: 0, Ni: 0, Mo: 0 },
    // Plain carbon, low hardenability: small sections about 20–25 HRC, larger ones softer.
    typicalCoreHardnessHrc: 22,
  },
  {
    id: 'sae-1020',
    name: 'SAE 1020',
    coreCarbonPct: 0.2,
    composition: { Si: 0.2, Mn: 0.45, Cr: 0, Ni: 0, Mo: 0 },
    // Plain carbon with less manganese than 1018: the core barely hardens.
    typicalCoreHardnessHrc: 20,
  },
  {
    id: 'sae-4118',
    name: 'SAE 4118',
    coreCarbonPct: 0.2,
    composition: { Si: 0.25, Mn: 0.8, Cr: 0.5, Ni: 0, Mo: 0.11 },
    // Lean Cr–Mo: typically 25–35 HRC.
    typicalCoreHardnessHrc: 30,
  },
  {
    id: 'sae-4320',
    name: 'SAE 4320',
    coreCarbonPct: 0.2,
    composition: { Si: 0.25, Mn: 0.55, Cr: 0.5, Ni: 1.8, Mo: 0.25 },
    // More hardenable than 8620 (nickel): typically 35–45 HRC.
    typicalCoreHardnessHrc: 40,
  },
  {
    id: 'sae-4620',
    name: 'SAE 4620',
    coreCarbonPct: 0.2,
    composition: { Si: 0.25, Mn: 0.55, Cr: 0, Ni: 1.8, Mo: 0.25 },
    // Ni–Mo without chromium: typically 28–38 HRC.
    typicalCoreHardnessHrc: 32,
  },
  {
    id: 'sae-8620',
    name: 'SAE 8620',
    coreCarbonPct: 0.2,
    composition: { Si: 0.25, Mn: 0.8, Cr: 0.5, Ni: 0.55, Mo: 0.2 },
    // Typically 30–40 HRC.
    typicalCoreHardnessHrc: 35,
  },
  {
    id: 'sae-8822',
    name: 'SAE 8822',
    coreCarbonPct: 0.22,
    composition: { Si: 0.25, Mn: 0.88, Cr: 0.5, Ni: 0.55, Mo: 0.35 },
    // 8620 with more carbon and molybdenum: typically 33–43 HRC.
    typicalCoreHardnessHrc: 38,
  },
  {
    id: 'sae-9310',
    name: 'SAE 9310',
    coreCarbonPct: 0.1,
    composition: { Si: 0.25, Mn: 0.55, Cr: 1.2, Ni: 3.25, Mo: 0.11 },
    // High nickel, low carbon: a tough core of typically 32–40 HRC.
    typicalCoreHardnessHrc: 36,
  },
  {
    id: '16mncr5',
    name: '16MnCr5',
    coreCarbonPct: 0.16,
    composition: { Si: 0.25, Mn: 1.15, Cr: 0.95, Ni: 0, Mo: 0 },
    // Typically 28–38 HRC depending on section.
    typicalCoreHardnessHrc: 33,
  },
  {
    id: '20mncr5',
    name: '20MnCr5',
    coreCarbonPct: 0.2,
    composition: { Si: 0.25, Mn: 1.25, Cr: 1.15, Ni: 0, Mo: 0 },
    // Typically 30–42 HRC depending on section.
    typicalCoreHardnessHrc: 36,
  },
  {
    id: '18crnimo7-6',
    name: '18CrNiMo7-6',
    coreCarbonPct: 0.18,
    composition: { Si: 0.25, Mn: 0.7, Cr: 1.65, Ni: 1.55, Mo: 0.3 },
    // Deep hardening for large gears: typically 36–45 HRC.
    typicalCoreHardnessHrc: 40,
  },
  {
    id: '20nicrmo2-2',
    name: '20NiCrMo2-2',
    coreCarbonPct: 0.2,
    composition: { Si: 0.25, Mn: 0.8, Cr: 0.5, Ni: 0.55, Mo: 0.2 },
    // The EN counterpart of SAE 8620: typically 30–40 HRC.
    typicalCoreHardnessHrc: 35,
  },
];

export function findGrade(id: string): SteelGrade | undefined {
  return STEEL_GRADES.find((g) => g.id === id);
}

/** A grade by its id or by its name as written (`"SAE 1018"`, any case or spacing). */
export function findGradeByIdOrName(text: string): SteelGrade | undefined {
  const key = text.replace(/\s+/g, '').toLowerCase();
  return findGrade(text) ?? STEEL_GRADES.find((g) => g.name.replace(/\s+/g, '').toLowerCase() === key);
}
