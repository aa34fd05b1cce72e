/** The physics engine's public surface, shared by the CLI, the app, the tests and the benchmarks. */
export * from './result';
export * from './units';
export * from './diffusivity';
export * from './closedForm';
export * from './rulesOfThumb';
export * from './steel';
export * from './hardness';
export * from './cautions';
export * from './caseDepth';
export * from './equivalentTime';
export * from './conversions';
export * from './grades';
export * from './uncertainty';
export * from './calibration';
