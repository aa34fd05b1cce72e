/**
 * Indicative predicted hardness from carbon, drawn so that it agrees with the case criterion:
 * it meets the criterion's hardness exactly at the ECD threshold carbon (so at the predicted
 * effective case depth), the core hardness at core carbon, and never rises above the fully
 * martensitic ceiling (Just). It is a sketch of where a traverse should fall, not a hardenability
 * model: the core hardness and the threshold carry what the steel and the quench really do.
 *
 * Method: a straight line in carbon through (core carbon, core hardness) and (threshold carbon,
 * criterion hardness in HRC by the ASTM E140 rows), continued above the threshold until it meets
 * the ceiling and then following the ceiling; below core carbon, the core hardness. Everywhere
 * the lower of that line and the ceiling. Both rise with carbon, so the curve does too.
 */
import { findGradeByIdOrName } from './grades';
import { asQuenchedHardnessHrc, CASE_CRITERIA, CONVERTIBLE_RANGE, hardnessIn, type Hardness } from './hardness';
import { fail, ok, type Result, type Warning } from './result';

/** The anchors of the curve. `thresholdCarbonPct` must lie above `coreCarbonPct`. */
export interface HardnessCurve {
  coreCarbonPct: number;
  coreHardnessHrc: number;
  thresholdCarbonPct: number;
  /** The case criterion in HRC. */
  limitHrc: number;
}

/**
 * Core hardness assumed for a steel that is not in the grade list, HRC: the middle of SAE 8620's
 * typical 30–40 HRC (common practice, from memory).
 */
export const DEFAULT_CORE_HARDNESS_HRC = 35;

/** The indicative hardness at `carbonPct`, HRC (see the module comment for the method). */
export function indicativeHardnessHrc(carbonPct: number, curve: HardnessCurve): number {
  const { coreCarbonPct: c0, thresholdCarbonPct: c1, limitHrc: h1 } = curve;
  const h0 = Math.min(curve.coreHardnessHrc, h1); // never falling with carbon
  const line = carbonPct <= c0 ? h0 : h0 + ((h1 - h0) * (carbonPct - c0)) / (c1 - c0);
  return Math.min(line, asQuenchedHardnessHrc(carbonPct));
}

/** Where the core hardness came from: the request, the grade's typical value, or the default. */
export type CoreHardnessSource = 'steel' | 'grade' | 'default';

export interface IndicativeHardnessBasis extends HardnessCurve {
  /** The case criterion as given (550 HV by default, ISO 18203). */
  limit: Hardness;
  coreSource: CoreHardnessSource;
}

export interface HardnessInputs {
  steel: { grade?: string; coreCarbonPct: number; coreHardness?: Hardness };
  thresholdCarbonPct: number;
  /** Absent: 550 HV (ISO 18203). */
  ecdHardnessLimit?: Hardness;
}

const round = (value: number, digits: number) => Number(value.toFixed(digits));

/** The core hardness in HRC and its source (a given core below the HRC table is refused by the readers). */
function coreHardness(steel: HardnessInputs['steel']): { hrc: number; source: CoreHardnessSource } {
  const given = steel.coreHardness && hardnessIn(steel.coreHardness, 'HRC');
  if (given !== undefined) return { hrc: given, source: 'steel' };
  const grade = steel.grade === undefined ? undefined : findGradeByIdOrName(steel.grade);
  return grade
    ? { hrc: grade.typicalCoreHardnessHrc, source: 'grade' }
    : { hrc: DEFAULT_CORE_HARDNESS_HRC, source: 'default' };
}

const limitOf = (input: HardnessInputs): Hardness => input.ecdHardnessLimit ?? CASE_CRITERIA['iso-18203'];
/** The limit in HRC; a limit below the table (refused by the readers) counts as the table's floor. */
const limitHrcOf = (limit: Hardness) => hardnessIn(limit, 'HRC') ?? CONVERTIBLE_RANGE.HRC.min;

/** The core must be softer than the criterion, or the case depth is undefined. */
export function checkCoreBelowLimit(input: HardnessInputs): Result<void> {
  const limit = limitOf(input);
  const core = coreHardness(input.steel);
  if (core.hrc < limitHrcOf(limit)) return ok(undefined);
  return fail('hardness.coreNotBelowLimit', core.source === 'steel' ? 'steel.coreHardness' : 'ecdHardnessLimit', {
    coreHrc: round(core.hrc, 1),
    limit: limit.value,
    limitUnit: limit.unit,
  });
}

/**
 * The curve's anchors for a steel, threshold and criterion, with cautions where the ceiling
 * overrides them: a core hardness above the ceiling at core carbon is lowered to it, and a
 * criterion above the ceiling at the threshold cannot be met there (the threshold is too low
 * for that criterion). A core not softer than the criterion (refused by checkCoreBelowLimit)
 * leaves the curve flat at the criterion below the threshold.
 */
export function indicativeHardnessBasis(input: HardnessInputs): {
  basis: IndicativeHardnessBasis;
  warnings: Warning[];
} {
  const limit = limitOf(input);
  const limitHrc = limitHrcOf(limit);
  const { coreCarbonPct } = input.steel;
  const core = coreHardness(input.steel);
  const warnings: Warning[] = [];
  const coreCeiling = asQuenchedHardnessHrc(coreCarbonPct);
  if (core.hrc > coreCeiling) {
    warnings.push({
      code: 'hardness.coreAboveCeiling',
      params: { coreHrc: round(core.hrc, 1), carbonPct: coreCarbonPct, ceilingHrc: round(coreCeiling, 1) },
    });
  }
  const thresholdCeiling = asQuenchedHardnessHrc(input.thresholdCarbonPct);
  if (thresholdCeiling < limitHrc) {
    warnings.push({
      code: 'hardness.limitAboveCeilingAtThreshold',
      params: {
        thresholdPct: input.thresholdCarbonPct,
        ceilingHrc: round(thresholdCeiling, 1),
        limit: limit.value,
        limitUnit: limit.unit,
      },
    });
  }
  return {
    basis: {
      coreCarbonPct,
      coreHardnessHrc: Math.min(core.hrc, coreCeiling, limitHrc),
      thresholdCarbonPct: input.thresholdCarbonPct,
      limitHrc,
      limit,
      coreSource: core.source,
    },
    warnings,
  };
}
