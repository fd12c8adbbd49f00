// A test double of the full-wave engine for the queue-mechanics tests only (the real engine has its own test in
// real-engine.test.ts): it reports progress in fixed steps, honours the abort signal, and returns a fixed result.
import type { FieldCheckEngine } from '../../../../src/worker/engine';
import type { FieldCheckResult, HomingResult } from '../../../../src/lib/schemas/field-check';

export interface ScriptedEngineState {
	started: number;
	aborted: number;
	finished: number;
}

/** A parallel-RLC S11 around 2.4 GHz (demo data, not a simulation). */
export function scriptedResult(): FieldCheckResult {
	const f0 = 2.4e9;
	const samples = Array.from({ length: 41 }, (_, i) => {
		const f = 2.2e9 + i * 1e7;
		const x = 30 * (f / f0 - f0 / f);
		const zRe = 48 / (1 + x * x);
		const zIm = (-48 * x) / (1 + x * x);
		const dRe = zRe + 50;
		const d2 = dRe * dRe + zIm * zIm;
		const nRe = zRe - 50;
		return { frequencyHz: f, s11Re: (nRe * dRe + zIm * zIm) / d2, s11Im: (zIm * dRe - nRe * zIm) / d2, resistanceOhm: zRe, reactanceOhm: zIm };
	});
	return {
		engine: { name: 'scripted test double', version: '0' },
		mode: 'quick',
		targetFrequencyHz: 2.45e9,
		referenceImpedanceOhm: 50,
		mesh: { cellsX: 10, cellsY: 10, cellsZ: 4, cellCount: 400, smallestCellMm: 0.4, largestCellMm: 2, timesteps: 1000 },
		energyDecayDb: -45,
		runSeconds: 1,
		samples,
		resonance: { frequencyHz: f0, s11Db: -35 },
		deviationFraction: (f0 - 2.45e9) / 2.45e9,
		s11AtTargetDb: -6,
		band: { lowHz: 2.37e9, highHz: 2.43e9 },
		minimumVswr: 1.04,
		pattern: null,
		refinement: null
	};
}

export function createScriptedEngine(opts: { steps: number; stepMs: number }): { engine: FieldCheckEngine; state: ScriptedEngineState } {
	const state: ScriptedEngineState = { started: 0, aborted: 0, finished: 0 };
	async function run(control: Parameters<FieldCheckEngine['runFieldCheck']>[2]): Promise<void> {
		state.started++;
		for (let step = 1; step <= opts.steps; step++) {
			await new Promise<void>((done, fail) => {
				const t = setTimeout(done, opts.stepMs);
				control.signal.addEventListener('abort', () => (clearTimeout(t), fail(new Error('aborted'))), { once: true });
				if (control.signal.aborted) (clearTimeout(t), fail(new Error('aborted')));
			}).catch((err) => {
				state.aborted++;
				throw err;
			});
			control.onProgress({ fraction: step / opts.steps, message: `step ${step} of ${opts.steps}` });
		}
		state.finished++;
	}
	const engine: FieldCheckEngine = {
		async runFieldCheck(_input, _options, control) {
			await run(control);
			return scriptedResult();
		},
		async runHoming(input, _options, control) {
			await run(control);
			const final = scriptedResult();
			const homing: HomingResult = {
				converged: true,
				stoppedBecause: 'resonance within 0.3 % (test double)',
				iterations: [{ step: 1, parameter: 'lengthMm', value: 31.2, resonanceHz: 2.4e9, s11AtTargetDb: -6, simulations: 1 }],
				tunedInput: { ...(input as Record<string, unknown>) },
				final
			};
			return homing;
		}
	};
	return { engine, state };
}
