/**
 * Equivalent time at the set temperature for a furnace's real temperature history.
 * With D following Arrhenius, time at a varying T(t) is worth
 * t_eq = ∫ D(T(t)) / D(T_set) dt at T_set (common practice for ramps and upsets).
 * At or below A1 (727 °C) there is no austenite, so that time counts as zero.
 */
import { DIFFUSIVITY_MODELS, type DiffusivityModelId } from './diffusivity';
import { fail, ok, type Result } from './result';
import { austeniteSpan } from './steel';
import { celsiusToKelvin } from './units';
import { readRequest } from './requestSpec';
import { EQUIVALENT_TIME_REQUEST } from './requestTables';

export { DEFAULT_HISTORY_CARBON_PCT } from './requestTables';
/** Simpson intervals per linear piece of the history (D varies smoothly within a piece). */
const SIMPSON_INTERVALS = 64;

export interface HistoryPoint {
  timeH: number;
  temperatureC: number;
}

export interface EquivalentTimeResult {
  setTemperatureC: number;
  model: DiffusivityModelId;
  carbonPct: number;
  /** Clock time covered by the history, h. */
  elapsedH: number;
  /** Time at the set temperature with the same diffusion, h. */
  equivalentTimeH: number;
  /** Elapsed minus equivalent: the diffusion time lost to running cool (negative when running hot), h. */
  lostTimeH: number;
  /** Soak the recipe asks for at the set temperature, h, when given. */
  requiredTimeH?: number;
  /** Further time at the set temperature to reach the required soak, h (0 when already reached). */
  extraTimeH?: number;
}

/** ∫ D(T)/D(T_set) dt over one linear piece from (t0, T0) to (t1, T1), in the unit of t; only its part above A1 counts. */
function pieceEquivalent(
  ratio: (tempC: number) => number,
  t0: number,
  temp0: number,
  t1: number,
  temp1: number,
): number {
  const span = austeniteSpan(temp0, temp1);
  if (!(t1 > t0) || !span) return 0;
  // Simpson runs over the part with austenite only, so it never straddles the jump to zero at A1.
  const at = (share: number) => ({ t: t0 + share * (t1 - t0), temp: temp0 + share * (temp1 - temp0) });
  const from = at(span.from);
  const until = at(span.until);
  const n = SIMPSON_INTERVALS;
  const h = (until.t - from.t) / n;
  let sum = 0;
  for (let i = 0; i <= n; i++) {
    const weight = i === 0 || i === n ? 1 : i % 2 === 1 ? 4 : 2;
    sum += weight * ratio(from.temp + ((until.temp - from.temp) * i) / n);
  }
  return (sum * h) / 3;
}

/** Equivalent time at `setTemperatureC` for a validated history, h. */
export function equivalentTimeH(
  history: readonly HistoryPoint[],
  setTemperatureC: number,
  model: DiffusivityModelId,
  carbonPct: number,
): number {
  const diffusivity = DIFFUSIVITY_MODELS[model].diffusivity;
  const reference = diffusivity(celsiusToKelvin(setTemperatureC), carbonPct);
  const ratio = (tempC: number) => diffusivity(celsiusToKelvin(tempC), carbonPct) / reference;
  let total = 0;
  for (let i = 1; i < history.length; i++) {
    const a = history[i - 1]!;
    const b = history[i]!;
    total += pieceEquivalent(ratio, a.timeH, a.temperatureC, b.timeH, b.temperatureC);
  }
  return total;
}

/** The readings in time order (the reader checks each one's range). */
function checkHistory(points: readonly HistoryPoint[]): Result<HistoryPoint[]> {
  for (let index = 1; index < points.length; index++) {
    const value = points[index]!.timeH;
    if (value < points[index - 1]!.timeH)
      return fail('history.notIncreasing', `history.${index}.timeH`, { index, value });
  }
  const elapsed = points[points.length - 1]!.timeH - points[0]!.timeH;
  return elapsed > 0 ? ok([...points]) : fail('time.notPositive', 'history', { value: elapsed });
}

/**
 * `equivalent-time`: request `{history: [{timeH, temperatureC}], setTemperatureC,
 * requiredTimeH?, model?, carbonPct?}`; the history is piecewise linear between points.
 */
export function equivalentTime(request: unknown): Result<EquivalentTimeResult> {
  const read = readRequest(EQUIVALENT_TIME_REQUEST, request);
  if (!read.ok) return read;
  const history = checkHistory(read.value.history);
  if (!history.ok) return history;
  const { setTemperatureC, model, carbonPct, requiredTimeH } = read.value;
  const points = history.value;
  const elapsedH = points[points.length - 1]!.timeH - points[0]!.timeH;
  const eqH = equivalentTimeH(points, setTemperatureC, model, carbonPct);
  return ok({
    setTemperatureC,
    model,
    carbonPct,
    elapsedH,
    equivalentTimeH: eqH,
    lostTimeH: elapsedH - eqH,
    ...(requiredTimeH === undefined ? {} : { requiredTimeH, extraTimeH: Math.max(0, requiredTimeH - eqH) }),
  });
}
