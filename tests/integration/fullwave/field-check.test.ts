// Field check on the real openEMS engine (quick mode, 2 threads): resonance near target, cancellation, budget, missing engine.
import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { fieldCheckResultSchema, type FieldCheckProgress, type FieldCheckResult } from '../../../src/lib/schemas/field-check';
import { BudgetExceededError, EngineMissingError, FieldCheckAbortedError, runFieldCheck } from '../../../src/worker/fullwave';

const fixture = (name: string) => JSON.parse(readFileSync(resolve(__dirname, '../../fixtures/simulation', name, 'input.json'), 'utf8'));
const THREADS = 2;

describe('runFieldCheck on openEMS', () => {
	/** The quick check of the inset design, shared with the convergence test (one engine run fewer). */
	let insetQuick: FieldCheckResult | undefined;
	const savedEngine = process.env.FRINGEFIELD_OPENEMS;
	afterEach(() => {
		if (savedEngine === undefined) delete process.env.FRINGEFIELD_OPENEMS;
		else process.env.FRINGEFIELD_OPENEMS = savedEngine;
	});

	it('simulates a rectangular inset patch resonating within 3 % of its target', { timeout: 300_000 }, async () => {
		const progress: FieldCheckProgress[] = [];
		const result = await runFieldCheck(fixture('rectangular-inset'), { mode: 'quick', budgetSeconds: 280 }, { threads: THREADS, onProgress: (p) => progress.push(p) });
		insetQuick = result;
		expect(fieldCheckResultSchema.parse(result)).toEqual(result);
		expect(result.engine).toEqual({ name: 'openEMS', version: '0.0.35' });
		// the closed-form sizing (Balanis, Antenna Theory 4th ed., §14.2; transmission-line model, a few per cent) against the full-wave model
		expect(result.resonance).not.toBeNull();
		expect(Math.abs(result.deviationFraction!)).toBeLessThan(0.03);
		// the run ended on the −40 dB energy criterion, not on the timestep cap
		expect(result.energyDecayDb).toBeLessThanOrEqual(-40);
		expect(result.mesh.timesteps).toBeGreaterThan(1000);
		expect(result.mesh.cellCount).toBe(result.mesh.cellsX * result.mesh.cellsY * result.mesh.cellsZ);
		// a resonance is a dip: S11 there is below S11 at the band's ends
		expect(result.resonance!.s11Db).toBeLessThan(Math.min(...[result.samples[0], result.samples[result.samples.length - 1]].map((s) => 20 * Math.log10(Math.hypot(s.s11Re, s.s11Im)))));
		expect(progress.length).toBeGreaterThan(2);
		expect(progress[progress.length - 1].fraction).toBe(1);
		expect(progress.every((p, i) => i === 0 || p.fraction >= progress[i - 1].fraction)).toBe(true);
	});

	it('converges: the inset patch’s resonance moves < 1 % when the quick mesh is refined 1.5×', { timeout: 400_000 }, async () => {
		// mesh convergence (common practice for FDTD studies, no source); the < 0.5 % standard-mode figures are in README (npm run bench -- --fullwave)
		const coarse = insetQuick ?? (await runFieldCheck(fixture('rectangular-inset'), { mode: 'quick', budgetSeconds: 300 }, { threads: THREADS }));
		const fine = await runFieldCheck(fixture('rectangular-inset'), { mode: 'quick', budgetSeconds: 300 }, { threads: THREADS, refinement: 1.5 });
		// 1.5× finer in x and y, and 6 instead of 4 cells through the dielectric
		expect(fine.mesh.cellCount).toBeGreaterThan(coarse.mesh.cellCount * 1.5);
		const shift = (fine.resonance!.frequencyHz - coarse.resonance!.frequencyHz) / coarse.resonance!.frequencyHz;
		expect(Math.abs(shift)).toBeLessThan(0.01);
	});

	it('stops the engine when the signal aborts', { timeout: 60_000 }, async () => {
		const controller = new AbortController();
		const started = Date.now();
		const run = runFieldCheck(fixture('rectangular-probe'), { mode: 'standard' }, { threads: 1, signal: controller.signal, onProgress: (p) => p.message.includes('timestep') && controller.abort() });
		await expect(run).rejects.toBeInstanceOf(FieldCheckAbortedError);
		expect(Date.now() - started).toBeLessThan(45_000);
	});

	it('stops the engine at its time budget with an error naming the budget', { timeout: 60_000 }, async () => {
		const error = await runFieldCheck(fixture('rectangular-probe'), { mode: 'standard', budgetSeconds: 10 }, { threads: 1 }).catch((e: unknown) => e);
		expect(error).toBeInstanceOf(BudgetExceededError);
		expect((error as Error).message).toMatch(/budget of 10 s/);
	});

	it('says the engine is missing and how to install it', async () => {
		process.env.FRINGEFIELD_OPENEMS = '/nonexistent/openEMS';
		await expect(runFieldCheck(fixture('rectangular-inset'), { mode: 'quick' })).rejects.toBeInstanceOf(EngineMissingError);
		await expect(runFieldCheck(fixture('rectangular-inset'), { mode: 'quick' })).rejects.toThrow(/apt-get install openems/);
	});
});
