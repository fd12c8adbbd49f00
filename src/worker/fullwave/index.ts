// Public face of the full-wave engine runner (Node): Field check and Homing on the local openEMS.
export { runFieldCheck, threadCount, DEFAULT_ENGINE_THREADS, type FieldCheckContext } from './run-field-check';
export { runHoming } from './run-homing';
export { EngineMissingError, BudgetExceededError, FieldCheckAbortedError, EngineFailedError } from './errors';
export { findEngine, type EngineInfo } from './find-engine';
