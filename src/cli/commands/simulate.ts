// `simulate design.json [--quick|--accurate] [--tune] [--touchstone out.s1p]`: a Field check (or Homing) on the local openEMS.
import { readFileSync, writeFileSync } from 'node:fs';
import { writeTouchstone } from '../../lib/formats/touchstone';
import { GeometryError } from '../../lib/geometry';
import type { FieldCheckMode, FieldCheckResult } from '../../lib/schemas/field-check';
import { InputError, formatIssue } from '../../lib/schemas/input-error';
import { BudgetExceededError, EngineFailedError, EngineMissingError, runFieldCheck, runHoming } from '../../worker/fullwave';
import { ENGINE_INSTALL_HINT } from '../../worker/fullwave/find-engine';
import { UsageError } from '../usage-error';

/** Exit code when the full-wave engine is not installed. */
export const EXIT_ENGINE_MISSING = 4;
/** Exit code when the engine ran but failed or ran past its budget. */
export const EXIT_ENGINE_FAILED = 5;

export const summary = 'Field check: a full-wave simulation of the design on the local openEMS (--tune: Homing)';

export const help = `Usage: npm run cli -- simulate design.json [--quick|--accurate] [--tune] [--touchstone out.s1p]
                                           [--budget-seconds N] [--threads N]

Builds the design's artwork, meshes it and runs the openEMS full-wave engine locally (no server, no
database), then prints JSON: the simulated resonance in Hz and its deviation from the target, the
−10 dB band, S11 at the target, the minimum VSWR, the mesh (cells, timesteps), the run time and the
far field at the target (farField: broadside and peak directivity, gain, radiation efficiency; the
E/H-plane cuts are in the app and the API, not on the terminal).

  --quick             coarse mesh (λ/12 in the dielectric): a first look in about a minute
  --accurate          standard mesh and 1.5× refined; reports how far refinement moved the resonance
  --tune              Homing: moves the patch length (or radius), then the inset depth, probe
                      offset or quarter-wave section's impedance, at most 8 simulations; prints
                      the iterations and the tuned design-input document (with "overrides")
  --touchstone FILE   also write the simulated S11 as a Touchstone 1.1 file (.s1p)
  --budget-seconds N  wall-clock budget of each engine run (default 900)
  --threads N         engine threads (default 1, or FRINGEFIELD_OPENEMS_THREADS; one was faster
                      than two on a shared 2-core machine: measure before raising it)

The results are estimates of a model (sheet copper, no connector, no solder mask): confirm them by
measuring a built board.

Exit codes: 0 ok; 2 bad input; 4 the openEMS engine is not installed (${ENGINE_INSTALL_HINT});
5 the engine failed or ran past its budget.`;

interface SimulateArgs {
	file: string;
	mode: FieldCheckMode;
	tune: boolean;
	touchstone?: string;
	budgetSeconds?: number;
	threads?: number;
}

function parseArgs(argv: string[]): SimulateArgs {
	let file: string | undefined;
	let mode: FieldCheckMode = 'standard';
	let tune = false;
	let touchstone: string | undefined;
	let budgetSeconds: number | undefined;
	let threads: number | undefined;
	for (let i = 0; i < argv.length; i++) {
		const arg = argv[i];
		const value = () => {
			const v = argv[++i];
			if (v === undefined) throw new UsageError(`${arg} needs a value`);
			return v;
		};
		const wholeNumber = (raw: string, min: number, max: number) => {
			const n = Number(raw);
			if (raw.trim() === '' || !Number.isInteger(n) || n < min || n > max) throw new UsageError(`${arg}: "${raw}" must be a whole number; allowed range [${min}, ${max}]`);
			return n;
		};
		if (arg === '--quick' || arg === '--accurate') {
			if (mode !== 'standard') throw new UsageError('give one of --quick and --accurate');
			mode = arg === '--quick' ? 'quick' : 'accurate';
		} else if (arg === '--tune') tune = true;
		else if (arg === '--touchstone') touchstone = value();
		else if (arg === '--budget-seconds') budgetSeconds = wholeNumber(value(), 10, 7200);
		else if (arg === '--threads') threads = wholeNumber(value(), 1, 256);
		else if (arg.startsWith('--')) throw new UsageError(`unknown option "${arg}"; one of --quick, --accurate, --tune, --touchstone, --budget-seconds, --threads`);
		else if (file === undefined) file = arg;
		else throw new UsageError(`one design file only; also got "${arg}"`);
	}
	if (file === undefined) throw new UsageError('a design file is required: npm run cli -- simulate design.json [--quick|--accurate] [--tune]');
	return { file, mode, tune, touchstone, budgetSeconds, threads };
}

function readDocument(path: string): unknown {
	let text: string;
	try {
		text = readFileSync(path === '-' ? 0 : path, 'utf8');
	} catch (err) {
		const code = (err as NodeJS.ErrnoException).code;
		throw new UsageError(`design file "${path}" cannot be read${code ? ` (${code})` : ''}`);
	}
	try {
		return JSON.parse(text);
	} catch (err) {
		throw new UsageError(`${path}: not valid JSON (${err instanceof Error ? err.message : String(err)})`);
	}
}

/** The printed summary of one check (samples go to the Touchstone file, not the terminal). */
export function summaryOf(r: FieldCheckResult) {
	return {
		engine: r.engine,
		mode: r.mode,
		targetFrequencyHz: r.targetFrequencyHz,
		resonanceHz: r.resonance?.frequencyHz ?? null,
		resonanceS11Db: r.resonance?.s11Db ?? null,
		deviationFraction: r.deviationFraction,
		s11AtTargetDb: r.s11AtTargetDb,
		band: r.band,
		minimumVswr: r.minimumVswr,
		referenceImpedanceOhm: r.referenceImpedanceOhm,
		mesh: r.mesh,
		energyDecayDb: r.energyDecayDb,
		runSeconds: r.runSeconds,
		refinement: r.refinement,
		farField: r.pattern
			? {
					frequencyHz: r.pattern.frequencyHz,
					directivityDbi: r.pattern.directivityDbi,
					peakDirectivityDbi: r.pattern.peakDirectivityDbi,
					gainDbi: r.pattern.gainDbi,
					radiationEfficiency: r.pattern.radiationEfficiency,
					ePlanePhiDeg: r.pattern.ePlane.phiDeg
				}
			: null
	};
}

function touchstoneOf(r: FieldCheckResult, note: string): string {
	return writeTouchstone(
		{
			version: '1',
			portCount: 1,
			frequencyUnit: 'GHz',
			format: 'RI',
			referenceImpedanceOhm: [r.referenceImpedanceOhm],
			points: r.samples.map((s) => ({ frequencyHz: s.frequencyHz, s: [{ re: s.s11Re, im: s.s11Im }] })),
			noise: []
		},
		{ version: '1.1', comments: [`Fringefield Field check (${r.engine.name} ${r.engine.version}, ${r.mode} mode): ${note}`, 'A simulated estimate: confirm by measurement.'] }
	);
}

export async function run(argv: string[]): Promise<number> {
	try {
		const args = parseArgs(argv);
		const document = readDocument(args.file);
		const options = { mode: args.mode, ...(args.budgetSeconds ? { budgetSeconds: args.budgetSeconds } : {}) };
		const context = {
			threads: args.threads,
			onProgress: (p: { fraction: number; message: string }) => process.stderr.write(`${(p.fraction * 100).toFixed(0).padStart(3)} % ${p.message}\n`)
		};
		let output: Record<string, unknown>;
		let final: FieldCheckResult;
		if (args.tune) {
			const homing = await runHoming(document, options, context);
			final = homing.final;
			output = { converged: homing.converged, stoppedBecause: homing.stoppedBecause, iterations: homing.iterations, tunedInput: homing.tunedInput, final: summaryOf(final) };
		} else {
			final = await runFieldCheck(document, options, context);
			output = summaryOf(final);
		}
		if (args.touchstone) writeFileSync(args.touchstone, touchstoneOf(final, args.file));
		console.log(JSON.stringify(output, null, 2));
		return 0;
	} catch (err) {
		if (err instanceof UsageError) {
			console.error(err.message);
			return 2;
		}
		if (err instanceof InputError) {
			console.error(formatIssue(err.first));
			return 2;
		}
		if (err instanceof GeometryError) {
			console.error(`${err.code}: ${err.message}`);
			return 2;
		}
		if (err instanceof EngineMissingError) {
			console.error(err.message);
			return EXIT_ENGINE_MISSING;
		}
		if (err instanceof EngineFailedError || err instanceof BudgetExceededError) {
			console.error(err.message);
			return EXIT_ENGINE_FAILED;
		}
		throw err;
	}
}
