// Sweep documents: plan, build, serialise, JSON Schema.
export * from './plan';
export * from './document';
export { applicableInput, buildSweepDocument, checkPlanFitsDesign, serializeSweep, sweepCombinations, sweepPointInput, sweepTextPieces } from './build';
export { sweepJsonSchema, sweepJsonSchemaV1 } from './schema';
export { FREQUENCY_WINDOW_FRACTION, solverSetupOf, type SolverPort, type SolverSetup } from './solver-setup';
