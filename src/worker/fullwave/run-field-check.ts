// One Field check: design input → model → openEMS subprocess → post-processor → FieldCheckResult.
import { spawn } from 'node:child_process';
import { mkdtemp, mkdir, readFile, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { buildArtwork } from '../../lib/artwork';
import { size } from '../../lib/rf';
import type { SizedDesign } from '../../lib/rf/sized-design';
import { fieldCheckOptionsSchema, type FieldCheckOptions, type FieldCheckProgress, type FieldCheckResult } from '../../lib/schemas/field-check';
import { parseWith } from '../../lib/schemas/input-error';
import { parseDesignInput } from '../../lib/schemas';
import {
	ACCURATE_REFINEMENT,
	PORT_CURRENT_FILE,
	PORT_VOLTAGE_FILE,
	analyzePortSeries,
	buildFieldModel,
	meshStatistics,
	parsePortSeries,
	serializeFieldModel,
	type FieldModel
} from '../../lib/simulation';
import { BudgetExceededError, EngineFailedError, EngineMissingError, FieldCheckAbortedError } from './errors';
import { computeFarField } from './far-field';
import { ENGINE_INSTALL_HINT, engineBinary, findEngine } from './find-engine';

export interface FieldCheckContext {
	/** Stops the run: the engine's process group is killed and FieldCheckAbortedError thrown. */
	signal?: AbortSignal;
	onProgress?: (progress: FieldCheckProgress) => void;
	/** Folder for the model and the engine's output (default: a fresh temp folder, removed after). */
	workDir?: string;
	/** Engine threads (default FRINGEFIELD_OPENEMS_THREADS, else DEFAULT_ENGINE_THREADS). */
	threads?: number;
	/** Extra mesh refinement over the mode (default 1): a convergence study's knob, not a user option. */
	refinement?: number;
}

/** What one engine run gives back before the post-processor. */
interface EngineRun {
	model: FieldModel;
	energyDecayDb: number;
	timesteps: number;
	runSeconds: number;
	voltageText: string;
	currentText: string;
	/** The far field at the target, when the model recorded a near-field box. */
	pattern: FieldCheckResult['pattern'];
}

/**
 * The engine's progress line: "[@ 40s] Timestep: 10846 || Speed: 18.4 MC/s (…) || Energy: ~5.43e-16 (-18.13dB)"; while
 * the pulse is still going in it prints "(- 0.00dB)", with a space.
 */
const PROGRESS_LINE = /Timestep:\s*(\d+).*Energy:\s*~?\s*\S+\s*\((-?\s*[\d.]+|-?\s*inf)\s*dB\)/i;
/** The engine's start-up line "Excitation signal length is: 6806 timesteps (3.89792e-09s)". */
const EXCITATION_LINE = /Excitation signal length is:\s*(\d+)\s*timesteps/i;
/**
 * The share of a run's progress bar given to the excitation pulse (timesteps over the pulse's length); the rest follows
 * the energy's fall towards the end criterion. The engine prints progress only every few seconds, and the energy stays
 * at 0 dB until the pulse is over: without this share a run of ten seconds showed no progress before it ended.
 */
const EXCITATION_PROGRESS_SHARE = 0.2;
const FINAL_LINE = /Time for\s+(\d+)\s+iterations/i;

/**
 * Engine threads when neither the caller nor FRINGEFIELD_OPENEMS_THREADS names a number. One: on the shared 2-core
 * machine the engine's own speed figure (openEMS 0.0.35, its default multithreaded compressed-SSE engine, the
 * circular-probe bench case in standard mode, four alternating 24 s runs each under a load average of 5–10) read
 * 111–168 MC/s (mean 141) with one thread against 97–133 MC/s (mean 109) with two: one thread finished a check about
 * 1.3× sooner, and a second core is better spent on a second worker (README "Scaling out", BENCHMARKS.md "Job queue").
 */
export const DEFAULT_ENGINE_THREADS = 1;

export function threadCount(context: Pick<FieldCheckContext, 'threads'>): number {
	const fromEnv = Number(process.env.FRINGEFIELD_OPENEMS_THREADS);
	if (context.threads && context.threads > 0) return Math.floor(context.threads);
	if (Number.isInteger(fromEnv) && fromEnv > 0) return fromEnv;
	return DEFAULT_ENGINE_THREADS;
}

/** The reference impedance of the port: the feed line's Z0, or the target (the coax) for a probe. */
function referenceImpedanceOf(sized: SizedDesign): number {
	switch (sized.feed.kind) {
		case 'probe':
			return sized.input.targetImpedanceOhm;
		case 'edge':
		case 'inset':
		case 'quarter-wave':
		case 'aperture-coupled':
		case 'proximity-coupled':
			return sized.input.feedLineImpedanceOhm;
		default:
			return sized.feed satisfies never;
	}
}

/** Runs the engine on one model in `dir`; reports the energy decay as progress from `from` to `to`. */
async function runEngine(
	model: FieldModel,
	dir: string,
	budgetSeconds: number,
	context: FieldCheckContext,
	progressSpan: { from: number; to: number; label: string }
): Promise<EngineRun> {
	await mkdir(dir, { recursive: true });
	await writeFile(join(dir, 'model.xml'), serializeFieldModel(model));
	const started = performance.now();
	const report = (fraction: number, message: string) => context.onProgress?.({ fraction: progressSpan.from + (progressSpan.to - progressSpan.from) * Math.min(1, Math.max(0, fraction)), message });
	report(0, `${progressSpan.label}: starting the engine`);
	if (context.signal?.aborted) throw new FieldCheckAbortedError('the Field check was cancelled before the engine started');

	let energyDb = 0;
	let timesteps = 0;
	let excitationTimesteps = 0;
	let best = 0;
	const child = spawn(engineBinary(), ['model.xml', `--numThreads=${threadCount(context)}`], { cwd: dir, detached: true, stdio: ['ignore', 'pipe', 'pipe'] });
	const killGroup = () => {
		try {
			if (child.pid) process.kill(-child.pid, 'SIGKILL');
		} catch {
			// already gone
		}
	};
	let stopReason: Error | null = null;
	const onAbort = () => {
		stopReason = new FieldCheckAbortedError('the Field check was cancelled; the engine was stopped');
		killGroup();
	};
	context.signal?.addEventListener('abort', onAbort, { once: true });
	const budgetTimer = setTimeout(() => {
		stopReason = new BudgetExceededError(`the engine ran past the Field check's time budget of ${budgetSeconds} s (budgetSeconds) and was stopped; raise the budget or use quick mode`);
		killGroup();
	}, budgetSeconds * 1000);

	let tail = '';
	const onText = (chunk: Buffer) => {
		tail += chunk.toString('utf8');
		const lines = tail.split(/\r?\n|\r/);
		tail = lines.pop() ?? '';
		for (const line of lines) {
			const e = EXCITATION_LINE.exec(line);
			if (e) excitationTimesteps = Number(e[1]);
			const m = PROGRESS_LINE.exec(line);
			if (m) {
				timesteps = Number(m[1]);
				const text = m[2].replace(/\s/g, '');
				energyDb = text.toLowerCase().includes('inf') ? -Infinity : Number(text);
				// the pulse, then the energy's fall towards the end criterion (−35 dB), which is not monotonic: report the best reached
				const pulse = excitationTimesteps > 0 ? Math.min(1, timesteps / excitationTimesteps) : 0;
				const decay = Math.min(1, Math.max(0, energyDb / model.endCriterionDb));
				best = Math.max(best, EXCITATION_PROGRESS_SHARE * pulse + (1 - EXCITATION_PROGRESS_SHARE) * decay);
				report(best, `${progressSpan.label}: timestep ${timesteps}, energy ${energyDb.toFixed(1)} dB`);
			}
			const f = FINAL_LINE.exec(line);
			if (f) timesteps = Number(f[1]);
		}
	};
	child.stdout.on('data', onText);
	child.stderr.on('data', onText);

	const exitCode = await new Promise<number | null>((resolve, reject) => {
		child.on('error', (err: NodeJS.ErrnoException) => {
			if (err.code === 'ENOENT') reject(new EngineMissingError(`the full-wave engine (${engineBinary()}) is not installed; ${ENGINE_INSTALL_HINT}`));
			else reject(new EngineFailedError(`the engine could not start: ${err.message}`));
		});
		child.on('close', (code) => resolve(code));
	}).finally(() => {
		clearTimeout(budgetTimer);
		context.signal?.removeEventListener('abort', onAbort);
	});
	if (stopReason) throw stopReason;
	if (exitCode !== 0) throw new EngineFailedError(`the engine stopped with exit code ${exitCode}${tail ? `: ${tail.slice(-200)}` : ''}`);
	const read = async (name: string) => {
		try {
			return await readFile(join(dir, name), 'utf8');
		} catch {
			throw new EngineFailedError(`the engine wrote no ${name} file`);
		}
	};
	const [voltageText, currentText] = await Promise.all([read(PORT_VOLTAGE_FILE), read(PORT_CURRENT_FILE)]);
	let pattern: FieldCheckResult['pattern'] = null;
	if (model.nearFieldBox) {
		report(1, `${progressSpan.label}: far-field transform`);
		pattern = await computeFarField(dir, model.targetFrequencyHz, { voltage: parsePortSeries(voltageText), current: parsePortSeries(currentText) }, context.signal);
	}
	report(1, `${progressSpan.label}: done`);
	return { model, energyDecayDb: energyDb, timesteps, runSeconds: (performance.now() - started) / 1000, voltageText, currentText, pattern };
}

function resultOf(run: EngineRun, engineVersion: string, mode: FieldCheckOptions['mode']): FieldCheckResult {
	const { model } = run;
	const analysis = analyzePortSeries({
		voltage: parsePortSeries(run.voltageText),
		current: parsePortSeries(run.currentText),
		referenceImpedanceOhm: model.port.referenceImpedanceOhm,
		targetFrequencyHz: model.targetFrequencyHz,
		band: model.band
	});
	return {
		engine: { name: 'openEMS', version: engineVersion },
		mode,
		targetFrequencyHz: model.targetFrequencyHz,
		referenceImpedanceOhm: model.port.referenceImpedanceOhm,
		mesh: meshStatistics(model.mesh, run.timesteps),
		energyDecayDb: Number.isFinite(run.energyDecayDb) ? run.energyDecayDb : -300,
		runSeconds: run.runSeconds,
		...analysis,
		pattern: run.pattern,
		refinement: null
	};
}

/**
 * Runs one Field check of a design-input document. Throws InputError for a bad document or a
 * design the model cannot hold, EngineMissingError, BudgetExceededError (naming the budget),
 * FieldCheckAbortedError or EngineFailedError. Accurate mode runs the standard mesh and the 1.5×
 * refined one, reports the refined result and how far refinement moved the resonance; the
 * budget applies to each run.
 */
export async function runFieldCheck(input: unknown, options: Partial<FieldCheckOptions>, context: FieldCheckContext = {}): Promise<FieldCheckResult> {
	const opts = parseWith(fieldCheckOptionsSchema, options);
	const sized = size(parseDesignInput(input));
	const artwork = buildArtwork(sized);
	const zRef = referenceImpedanceOf(sized);
	const models =
		opts.mode === 'accurate'
			? // the far field of the refined run only: the standard run gives the resonance shift
				[buildFieldModel(artwork, zRef, { mode: 'accurate', refinement: 1, nearFarField: false }), buildFieldModel(artwork, zRef, { mode: 'accurate', refinement: ACCURATE_REFINEMENT })]
			: [buildFieldModel(artwork, zRef, { mode: opts.mode, refinement: context.refinement ?? 1 })];
	const engine = await findEngine();
	if (!engine) throw new EngineMissingError(`the full-wave engine (${engineBinary()}) is not installed; ${ENGINE_INSTALL_HINT}`);

	const dir = context.workDir ?? (await mkdtemp(join(tmpdir(), 'fringefield-field-check-')));
	try {
		const runs: EngineRun[] = [];
		for (const [i, model] of models.entries()) {
			const span = { from: i / models.length, to: (i + 1) / models.length, label: models.length > 1 ? `mesh ${i + 1} of ${models.length} (×${model.refinement})` : 'simulation' };
			runs.push(await runEngine(model, models.length > 1 ? join(dir, `run-${i + 1}`) : dir, opts.budgetSeconds, context, span));
		}
		const final = resultOf(runs[runs.length - 1], engine.version, opts.mode);
		if (runs.length === 1) return final;
		const standard = resultOf(runs[0], engine.version, opts.mode);
		const finalHz = final.resonance?.frequencyHz;
		const standardHz = standard.resonance?.frequencyHz;
		return {
			...final,
			runSeconds: runs.reduce((a, r) => a + r.runSeconds, 0),
			refinement: finalHz && standardHz ? { standardResonanceHz: standardHz, shiftFraction: (finalHz - standardHz) / standardHz } : null
		};
	} finally {
		if (!context.workDir) await rm(dir, { recursive: true, force: true });
	}
}
