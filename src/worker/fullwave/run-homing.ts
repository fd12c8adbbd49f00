// Homing: secant steps on the resonant dimension, then on the feed, each step one Field check.
import type { FieldCheckOptions, HomingResult } from '../../lib/schemas/field-check';
import type { FieldCheckContext } from './run-field-check';

/**
 * Moves the resonant dimension (length or radius) until the simulated resonance is within 0.3 % of
 * the target, then the feed (inset depth, probe offset, transformer impedance) until S11 ≤ −20 dB at
 * the target; at most 8 simulations. Returns the iterations and the tuned design-input document.
 */
export async function runHoming(input: unknown, options: Partial<FieldCheckOptions>, context: Omit<FieldCheckContext, 'workDir'> = {}): Promise<HomingResult> {
	void input;
	void options;
	void context;
	throw new Error('runHoming: not built yet');
}
