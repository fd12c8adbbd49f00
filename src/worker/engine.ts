// What the worker asks of a full-wave engine: run one field check or one Homing study of a design input, report
// progress, and stop when the signal aborts. The product's engine is src/worker/fullwave (openEMS as a subprocess).
import type { DesignInput } from '../lib/schemas';
import type { FieldCheckOptions, FieldCheckProgress, FieldCheckResult, HomingResult } from '../lib/schemas/field-check';

export interface EngineControl {
	signal: AbortSignal;
	onProgress: (progress: FieldCheckProgress) => void;
}

export interface FieldCheckEngine {
	runFieldCheck(input: DesignInput, options: FieldCheckOptions, control: EngineControl): Promise<FieldCheckResult>;
	runHoming(input: DesignInput, options: FieldCheckOptions, control: EngineControl): Promise<HomingResult>;
}
