// Sweep documents: plan, build, serialise, JSON Schema.
export * from './plan';
export * from './document';
export { buildSweepDocument, serializeSweep, sweepCombinations, sweepTextPieces } from './build';
export { sweepJsonSchema } from './schema';
