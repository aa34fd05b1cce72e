/**
 * Demo log for the invented plant (Kestrel Ridge Drivetrain Works: furnaces F1–F3, parts
 * KR-2231, KR-4410, KR-0907, shifts A/B/C, operators by initials). Deterministic for a seed.
 * Predictions come from the physics engine; "lab" depths are the prediction with an invented
 * per-furnace offset and scatter, so the comparison screens have something to show.
 *
 * Nothing of it reaches a real log unasked: the app loads this module only through the log's
 * "load demo data" action (import() from the files view), and the tests use it as a fixture.
 */
import { DEFAULT_SHIFT_CONFIG, shiftOf, type Job, type JobStatus, type ShiftConfig } from '../../../jobs';
import { findGrade, mulberry32, timeForCaseDepth, type TimeResult } from '../../../physics';

export interface DemoOptions {
  count: number;
  /** The log ends here and spans the year before. */
  end?: Date;
  seed?: number;
  appVersion?: string;
  shiftConfig?: ShiftConfig;
}

interface DemoPart {
  partNumber: string;
  gradeId: string;
  targetEcdMm: number;
  carbonPotentialPct: number;
  temperaturesC: readonly number[];
  furnaces: readonly string[];
}

// Targets sit in the middle of each part's drawing range (DOMAIN scenario).
const PARTS: readonly DemoPart[] = [
  {
    partNumber: 'KR-2231',
    gradeId: 'sae-8620',
    targetEcdMm: 0.875,
    carbonPotentialPct: 0.9,
    temperaturesC: [920, 925, 930],
    furnaces: ['F1', 'F1', 'F2'],
  },
  {
    partNumber: 'KR-4410',
    gradeId: '20mncr5',
    targetEcdMm: 1.35,
    // 0.8 × the alloy factor of 20MnCr5 (1.118): about 0.89 %C at the surface.
    carbonPotentialPct: 0.8,
    temperaturesC: [930, 940],
    furnaces: ['F2', 'F2', 'F1'],
  },
  {
    partNumber: 'KR-0907',
    gradeId: 'sae-1018',
    targetEcdMm: 0.32,
    carbonPotentialPct: 0.85,
    temperaturesC: [900, 910],
    furnaces: ['F3', 'F1'],
  },
];

/** Part numbers of the demo plant. */
export const DEMO_PART_NUMBERS: readonly string[] = PARTS.map((p) => p.partNumber);

// Initials only (DOMAIN §5), none of them a trade abbreviation (HV, CO, AT, HRC…).
const OPERATORS = ['MK', 'JR', 'AL', 'LS', 'PW', 'DN', 'EH', 'RB', 'CG'];
const LAB_INITIALS = ['QL', 'WN', 'TF'];
const NOTES = [
  '',
  '',
  '',
  'Coupon in basket 3.',
  'Load 20 min late; time extended as calculated.',
  '-10 °C dip at 2 h, recovered in 15 min.',
  'Door opened for sample at 3 h.',
  'Quench oil 65 °C at start.',
  'Mixed load with sample pins.',
];
/** Invented furnace offsets of the lab depth against the prediction. */
const FURNACE_BIAS: Record<string, number> = { F1: 0.02, F2: -0.04, F3: 0.0 };
/** The demo plant's furnaces. */
export const DEMO_FURNACES: readonly string[] = Object.keys(FURNACE_BIAS);

function uuidFrom(random: () => number): string {
  const hex = Array.from({ length: 32 }, () => Math.floor(random() * 16).toString(16));
  hex[12] = '4';
  hex[16] = ((Number.parseInt(hex[16]!, 16) & 0x3) | 0x8).toString(16);
  const h = hex.join('');
  return `${h.slice(0, 8)}-${h.slice(8, 12)}-${h.slice(12, 16)}-${h.slice(16, 20)}-${h.slice(20)}`;
}

const round = (x: number, digits: number) => Math.round(x * 10 ** digits) / 10 ** digits;

export function demoJobs(options: DemoOptions): Job[] {
  const random = mulberry32(options.seed ?? 2231);
  const pick = <T>(items: readonly T[]): T => items[Math.floor(random() * items.length)]!;
  const endMs = (options.end ?? new Date()).getTime();
  const spanMs = 365 * 24 * 3600 * 1000;
  const appVersion = options.appVersion ?? 'demo';
  const predictions = new Map<string, TimeResult>();
  const predict = (part: DemoPart, temperatureC: number, request: Record<string, unknown>) => {
    const key = `${part.partNumber}@${temperatureC}`;
    if (!predictions.has(key)) {
      const result = timeForCaseDepth(request);
      if (!result.ok) throw new Error(`demo request rejected: ${result.error.code}`);
      predictions.set(key, result.value);
    }
    return predictions.get(key)!;
  };
  const times = Array.from({ length: options.count }, () => endMs - random() * spanMs).sort((a, b) => a - b);
  return times.map((createdMs, index) => {
    const part = pick(PARTS);
    const grade = findGrade(part.gradeId)!;
    const temperatureC = pick(part.temperaturesC);
    const request = {
      temperatureC,
      targetDepthMm: part.targetEcdMm,
      carbonPotentialPct: part.carbonPotentialPct,
      coreCarbonPct: grade.coreCarbonPct,
      composition: grade.composition,
    };
    const result = predict(part, temperatureC, request);
    const furnace = pick(part.furnaces);
    const created = new Date(Math.floor(createdMs));
    const ageH = (endMs - createdMs) / 3.6e6;
    const status: JobStatus =
      ageH < result.timeH
        ? pick(['planned', 'inFurnace'] as const)
        : random() < 0.94
          ? 'done'
          : pick(['onHold', 'rejected'] as const);
    const measured = status === 'done' && ageH > 30 && random() < 0.7;
    const labEcdMm = round(
      result.effectiveCaseDepthMm * (1 + (FURNACE_BIAS[furnace] ?? 0) + (random() - 0.5) * 0.12),
      2,
    );
    const updated = new Date(
      Math.min(endMs, createdMs + (status === 'done' ? (measured ? 30 : result.timeH + 1) * 3.6e6 : 0)),
    );
    return {
      id: uuidFrom(random),
      createdAt: created.toISOString(),
      updatedAt: new Date(Math.max(updated.getTime(), created.getTime())).toISOString(),
      ...shiftOf(created, options.shiftConfig ?? DEFAULT_SHIFT_CONFIG),
      operator: pick(OPERATORS),
      furnace,
      workOrder: `WO-${String(24000 + index).padStart(6, '0')}`,
      partNumber: part.partNumber,
      steel: {
        gradeId: grade.id,
        gradeName: grade.name,
        coreCarbonPct: grade.coreCarbonPct,
        composition: { ...grade.composition },
      },
      inputs: { kind: 'time' as const, ...request, composition: { ...grade.composition } },
      prediction: {
        effectiveCaseDepthMm: result.effectiveCaseDepthMm,
        totalCaseDepthMm: result.totalCaseDepthMm,
        surfaceCarbonPct: result.surfaceCarbonPct,
        model: result.model,
        timeH: result.timeH,
        temperatureC: result.temperatureC,
        ecdBandMm: { minMm: result.uncertaintyMm.minMm, maxMm: result.uncertaintyMm.maxMm },
        appVersion,
      },
      status,
      ...(measured
        ? {
            lab: {
              ecdMm: labEcdMm,
              surfaceHardness: { value: round(58 + random() * 4, 1), unit: 'HRC' as const },
              coreHardness: { value: Math.round(330 + random() * 60), unit: 'HV' as const },
              measuredAt: new Date(createdMs + 26 * 3.6e6).toISOString(),
              by: pick(LAB_INITIALS),
            },
          }
        : {}),
      notes: pick(NOTES),
    };
  });
}
