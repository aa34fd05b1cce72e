/**
 * The lab's figures of a job: from the traverse where there is one (its ECD at the limit it was
 * entered with, its first point, its levelled core), else as typed. Every reader of a lab result
 * (comparisons, depth correction, the plant's threshold, exports, cards) goes through here, so a
 * traverse and the figures shown beside it never disagree.
 */
import { analyseTraverse, readTraverse, type Hardness, type TraverseResult } from '../physics';
import type { Job, LabResult, StoredTraverse } from './schema';

export interface LabFigures {
  ecdMm?: number;
  surfaceHardness?: Hardness;
  coreHardness?: Hardness;
  /** Which figures the traverse gave (the rest were typed). */
  fromTraverse: { ecd: boolean; surface: boolean; core: boolean };
  /** The traverse analysed, when the lab result has one. */
  analysis?: TraverseResult;
}

// Records are never changed in place (every write makes a new object), so an analysis can be kept per record.
const analyses = new WeakMap<StoredTraverse, TraverseResult | null>();

/** A stored traverse analysed (null if the physics reader refuses it: a record the schema did not check). */
export function analyseStoredTraverse(traverse: StoredTraverse): TraverseResult | null {
  let analysis = analyses.get(traverse);
  if (analysis === undefined) {
    const read = readTraverse(traverse);
    analysis = read.ok ? analyseTraverse(read.value) : null;
    analyses.set(traverse, analysis);
  }
  return analysis;
}

export function labFigures(lab: LabResult | undefined): LabFigures {
  const analysis = lab?.traverse ? (analyseStoredTraverse(lab.traverse) ?? undefined) : undefined;
  const ecdMm = analysis?.effectiveCaseDepthMm ?? undefined;
  const surface = analysis?.surfaceHardness;
  const core = analysis?.coreHardness;
  const typedEcd = lab?.ecdMm;
  const typedSurface = lab?.surfaceHardness;
  const typedCore = lab?.coreHardness;
  return {
    ...(ecdMm !== undefined ? { ecdMm } : typedEcd !== undefined ? { ecdMm: typedEcd } : {}),
    ...(surface ? { surfaceHardness: surface } : typedSurface ? { surfaceHardness: typedSurface } : {}),
    ...(core ? { coreHardness: core } : typedCore ? { coreHardness: typedCore } : {}),
    fromTraverse: { ecd: ecdMm !== undefined, surface: surface !== undefined, core: core !== undefined },
    ...(analysis ? { analysis } : {}),
  };
}

/** The lab's ECD of a job, mm: the traverse's where it gives one, else the typed one; undefined without a positive depth. */
export function measuredEcdMm(job: Pick<Job, 'lab'>): number | undefined {
  const ecd = labFigures(job.lab).ecdMm;
  return ecd !== undefined && ecd > 0 ? ecd : undefined;
}
