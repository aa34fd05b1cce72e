/**
 * Cautions raised by the physics beside the results they concern. Shared by the
 * closed-form calculators and the cycle simulator so both say the same thing.
 */
import { MODEL_CALIBRATED_RANGE } from './diffusivity';
import { RETAINED_AUSTENITE_CARBON_PCT } from './hardness';
import type { Warning } from './result';
import { ac3TempC, hasAustenite, saturationCarbonPct, type Composition } from './steel';

/**
 * Below about 760 °C (1400 °F) a combustible atmosphere must not enter the chamber
 * without the prescribed inert purge (common practice, in line with NFPA 86).
 */
export const SAFE_ATMOSPHERE_MIN_TEMP_C = 760;

const round = (value: number, digits: number) => Number(value.toFixed(digits));

/** Carbon potential or surface carbon above saturation (Acm) at this temperature: carbides and soot. */
export function saturationWarnings(tempC: number, surfaceCarbonPct: number, carbonPotentialPct?: number): Warning[] {
  const limitPct = saturationCarbonPct(tempC);
  if (limitPct === undefined) return [];
  const warnings: Warning[] = [];
  if (carbonPotentialPct !== undefined && carbonPotentialPct > limitPct) {
    warnings.push({
      code: 'saturation.potentialAboveAcm',
      params: { carbonPct: round(carbonPotentialPct, 3), limitPct: round(limitPct, 2), tempC: round(tempC, 1) },
    });
  }
  if (surfaceCarbonPct > limitPct) {
    warnings.push({
      code: 'saturation.surfaceAboveAcm',
      params: { carbonPct: round(surfaceCarbonPct, 3), limitPct: round(limitPct, 2), tempC: round(tempC, 1) },
    });
  }
  return warnings;
}

/**
 * A potential that, through the alloy factor, draws the surface of this steel above saturation
 * (Cp × factor > Acm) while the potential itself is not: the surface heads for carbides.
 */
export function equilibriumSaturationWarning(tempC: number, potentialPct: number, alloyFactor: number): Warning[] {
  const limitPct = saturationCarbonPct(tempC);
  const equilibriumPct = potentialPct * alloyFactor;
  if (limitPct === undefined || potentialPct > limitPct || !(equilibriumPct > limitPct)) return [];
  return [
    {
      code: 'saturation.equilibriumAboveAcm',
      params: {
        potentialPct: round(potentialPct, 3),
        carbonPct: round(equilibriumPct, 3),
        limitPct: round(limitPct, 2),
        tempC: round(tempC, 1),
      },
    },
  ];
}

/**
 * Carburizing above A1 but below the core's Ac3 (Andrews 1965): the core is ferrite and
 * austenite, while the diffusivity models are for austenite alone.
 */
export function twoPhaseCoreWarning(tempC: number, coreCarbonPct: number, composition?: Composition): Warning[] {
  const ac3C = ac3TempC(coreCarbonPct, composition);
  return hasAustenite(tempC) && tempC < ac3C
    ? [{ code: 'austenite.twoPhaseCore', params: { tempC: round(tempC, 1), ac3C: round(ac3C, 0) } }]
    : [];
}

/** A carburizing atmosphere at a temperature below the safe-introduction limit. */
export function atmosphereTemperatureWarning(tempC: number): Warning[] {
  return tempC < SAFE_ATMOSPHERE_MIN_TEMP_C
    ? [
        {
          code: 'safety.atmosphereBelowSafeTemperature',
          params: { tempC: round(tempC, 1), minC: SAFE_ATMOSPHERE_MIN_TEMP_C },
        },
      ]
    : [];
}

/** Surface carbon high enough that retained austenite may lower the surface hardness. */
export function retainedAusteniteWarning(surfaceCarbonPct: number): Warning[] {
  return surfaceCarbonPct > RETAINED_AUSTENITE_CARBON_PCT
    ? [
        {
          code: 'hardness.retainedAustenite',
          params: { carbonPct: round(surfaceCarbonPct, 3), limitPct: RETAINED_AUSTENITE_CARBON_PCT },
        },
      ]
    : [];
}

/** Inputs outside the range where the three diffusivity models were compared. */
export function modelRangeWarning(tempC: number, carbonPct: number): Warning[] {
  const r = MODEL_CALIBRATED_RANGE;
  const outside = tempC < r.minTempC || tempC > r.maxTempC || carbonPct < r.minCarbonPct || carbonPct > r.maxCarbonPct;
  return outside
    ? [
        {
          code: 'model.outsideCalibratedRange',
          params: { minC: r.minTempC, maxC: r.maxTempC, minPct: r.minCarbonPct, maxPct: r.maxCarbonPct },
        },
      ]
    : [];
}
