// `npm run bench -- --fullwave [--cases a,b] [--skip-homing] [--skip-pattern] [--pattern-only] [--validation] [--engine-reference]`:
// Field check timings on the real openEMS, printed as Markdown, with the engine threads, the load average when each run
// started and the engine speed (cells × timesteps / seconds). Standard and accurate mode per case (accurate's shift is the mesh-convergence figure), one Homing
// study (quick mode), and the far field against the textbook patch (validation: full-wave directivity against the
// published design example's two-slot directivity) and against the sizing's estimate for every case. `--validation` runs
// only the measured patches (standard mode, one engine thread) against their published resonances; `--engine-reference`
// only the engine authors' own probe-fed patch against ours (scripts/bench/engine-reference.ts; needs Octave).
import { readFileSync } from 'node:fs';
import { cpus, loadavg } from 'node:os';
import { join } from 'node:path';
import { rootDir } from '../lib/config.ts';
import { ensureOpenEms } from '../lib/openems.ts';
import { runFieldCheck, runHoming, threadCount } from '../../src/worker/fullwave/index.ts';
import { size } from '../../src/lib/rf/index.ts';
import { parseDesignInput } from '../../src/lib/schemas/index.ts';
import type { FieldCheckResult } from '../../src/lib/schemas/field-check.ts';
import { impedanceResonance } from '../../src/lib/simulation/index.ts';
import { engineReferenceStudy } from './engine-reference.ts';

const CASES = ['rectangular-inset', 'rectangular-probe', 'circular-probe'];

const fixture = (name: string) => JSON.parse(readFileSync(join(rootDir, 'tests/fixtures/simulation', name, 'input.json'), 'utf8'));
/**
 * The validation patch: Balanis's rectangular design example (Antenna Theory 4th ed., Example 14.1; from memory):
 * εr 2.2, h 1.588 mm, 10 GHz → W 11.86 mm, L 9.06 mm, both pinned as overrides; probe-fed, on a ground 15 mm
 * (half a wavelength) beyond the patch so the finite board stays close to the textbook's infinite ground.
 */
const VALIDATION_PATCH = 'simulation-validation/balanis-10ghz';
const validationInput = () => JSON.parse(readFileSync(join(rootDir, 'tests/fixtures', VALIDATION_PATCH, 'input.json'), 'utf8'));
const ghz = (hz: number | null | undefined) => (hz ? (hz / 1e9).toFixed(4) : '—');
const pct = (f: number | null | undefined) => (f === null || f === undefined ? '—' : `${(f * 100).toFixed(2)} %`);

/**
 * One row. Engine speed in million cell-updates per second (MC/s, the engine's own unit; our cell count is the cells
 * between mesh lines, a little under the engine's count of lines): only for a single run, since accurate mode's
 * seconds cover two meshes and its cells and timesteps are the refined one's.
 */
function row(name: string, mode: string, r: FieldCheckResult, load: number): string {
	const speed = r.refinement ? '—' : ((r.mesh.cellCount * r.mesh.timesteps) / r.runSeconds / 1e6).toFixed(0);
	return `| ${name} | ${mode} | ${ghz(r.resonance?.frequencyHz)} | ${pct(r.deviationFraction)} | ${r.resonance ? r.resonance.s11Db.toFixed(1) : '—'} | ${r.mesh.cellCount} | ${r.mesh.timesteps} | ${r.runSeconds.toFixed(0)} | ${threadCount({})} | ${load.toFixed(1)} | ${speed} | ${r.refinement ? pct(r.refinement.shiftFraction) : '—'} |`;
}

export async function runFullwaveBench(argv: string[]): Promise<void> {
	if (!ensureOpenEms()) throw new Error('openEMS is needed for the Field check benchmark');
	const casesArg = argv.indexOf('--cases');
	const cases = casesArg >= 0 ? argv[casesArg + 1].split(',') : CASES;
	if (argv.includes('--pattern-only')) return console.log((await farFieldStudy(cases)).join('\n'));
	if (argv.includes('--validation')) return console.log((await measuredPatchStudy()).join('\n'));
	if (argv.includes('--engine-reference')) return console.log((await engineReferenceStudy()).join('\n'));
	const lines = [
		`Field check on openEMS, ${cpus().length} cores (${cpus()[0]?.model ?? 'unknown CPU'}), Node.js ${process.version}, ${new Date().toISOString().slice(0, 10)}.`,
		'',
		'| case | mode | resonance GHz | from target | S11 at resonance dB | cells | timesteps | seconds | threads | load | MC/s | shift on 1.5× refinement |',
		'| --- | --- | ---: | ---: | ---: | ---: | ---: | ---: | ---: | ---: | ---: | ---: |'
	];
	for (const name of cases) {
		for (const mode of ['quick', 'standard', 'accurate'] as const) {
			if (mode !== 'quick' && argv.includes('--quick-only')) continue;
			console.error(`${name}, ${mode}…`);
			const load = loadavg()[0];
			const r = await runFieldCheck(fixture(name), { mode, budgetSeconds: 7200 }, {});
			lines.push(row(name, mode, r, load));
			console.error(lines[lines.length - 1]);
		}
	}
	if (!argv.includes('--skip-homing')) {
		// the inset case, and a quarter-wave feed (its λg/4 section's impedance is the feed dimension; value in Ω)
		const studies = [
			{ name: 'rectangular-inset', input: fixture('rectangular-inset') },
			{ name: 'quarter-wave', input: JSON.parse(readFileSync(join(rootDir, 'tests/fixtures/simulation-homing/quarter-wave/input.json'), 'utf8')) }
		];
		for (const study of studies) {
			console.error(`Homing, ${study.name}, quick…`);
			const load = loadavg()[0];
			const started = performance.now();
			const h = await runHoming(study.input, { mode: 'quick', budgetSeconds: 7200 }, {});
			const seconds = (performance.now() - started) / 1000;
			lines.push('', `Homing (quick mode, ${study.name}): ${h.iterations.length} rows, ${h.iterations[h.iterations.length - 1]?.simulations ?? 0} simulations, ${seconds.toFixed(0)} s (${threadCount({})} engine thread(s), load ${load.toFixed(1)} at the start); ${h.converged ? 'converged' : 'not converged'}: ${h.stoppedBecause}.`);
			lines.push('', '| step | parameter | value mm (Ω for the section) | resonance GHz | S11 at target dB |', '| ---: | --- | ---: | ---: | ---: |');
			for (const it of h.iterations) lines.push(`| ${it.step} | ${it.parameter} | ${it.value.toFixed(3)} | ${ghz(it.resonanceHz)} | ${it.s11AtTargetDb.toFixed(1)} |`);
		}
	}
	if (!argv.includes('--skip-pattern')) lines.push('', ...(await farFieldStudy(cases)));
	console.log(lines.join('\n'));
}

const dbi = (v: number | null | undefined) => (v === null || v === undefined ? '—' : v.toFixed(2));

/**
 * The far field, standard mode: every case at its target, and the validation patch at its own simulated resonance
 * (a first run finds it; the second records the near field there, same geometry, probe position pinned).
 */
async function farFieldStudy(cases: string[]): Promise<string[]> {
	const lines = [
		'| case | at GHz | resonance GHz | directivity dBi (full-wave) | sizing estimate dBi | gain dBi (full-wave) | sizing gain dBi | radiation efficiency | E/H peak θ | seconds |',
		'| --- | ---: | ---: | ---: | ---: | ---: | ---: | ---: | ---: | ---: |'
	];
	const add = (name: string, input: unknown, r: FieldCheckResult) => {
		const est = size(parseDesignInput(input)).estimates;
		const p = r.pattern;
		const peak = (cut: NonNullable<FieldCheckResult['pattern']>['ePlane']) => cut.levels.reduce((b, l) => (l.levelDb > b.levelDb ? l : b), cut.levels[0]).thetaDeg;
		lines.push(
			`| ${name} | ${ghz(r.targetFrequencyHz)} | ${ghz(r.resonance?.frequencyHz)} | ${dbi(p?.directivityDbi)} | ${est.directivityDbi.toFixed(2)} | ${dbi(p?.gainDbi)} | ${est.gainDbi.toFixed(2)} | ${p?.radiationEfficiency === null || !p ? '—' : `${(p.radiationEfficiency * 100).toFixed(0)} %`} | ${p ? `${peak(p.ePlane)}° / ${peak(p.hPlane)}°` : '—'} | ${r.runSeconds.toFixed(0)} |`
		);
		console.error(lines[lines.length - 1]);
	};
	for (const name of cases) {
		console.error(`far field, ${name}, standard…`);
		add(name, fixture(name), await runFieldCheck(fixture(name), { mode: 'standard', budgetSeconds: 7200 }, {}));
	}
	console.error('far field, validation patch, standard (two runs)…');
	const input = validationInput();
	const first = await runFieldCheck(input, { mode: 'standard', budgetSeconds: 7200 }, {});
	add('textbook 10 GHz patch, at its target', input, first);
	if (first.resonance) {
		const sized = size(input);
		const offsetYMm = sized.feed.kind === 'probe' ? sized.feed.offsetYMm : undefined;
		const atResonance = { ...input, frequencyHz: first.resonance.frequencyHz, overrides: { ...input.overrides, ...(offsetYMm === undefined ? {} : { probeOffsetMm: offsetYMm }) } };
		add('textbook 10 GHz patch, at its simulated resonance', atResonance, await runFieldCheck(atResonance, { mode: 'standard', budgetSeconds: 7200 }, {}));
	}
	return lines;
}

/**
 * Measured patches from the Accuracy table (Chang, Long & Richards 1986 as tabulated by Kara 1996; from memory), W × L
 * pinned as overrides, probe-fed at the sizing's offset, on a ground 15 mm beyond the patch (the papers' boards are
 * not recalled); tanδ 0.001 assumed. Each is run at its measured frequency and read three ways: the S11 minimum
 * (50 Ω), the local peak of the input resistance and the reactance's + to − zero.
 */
const MEASURED_PATCHES = [
	{ row: 'R6', dir: 'simulation-validation/measured-r6', measuredHz: 5.06e9 },
	{ row: 'R8', dir: 'simulation-validation/measured-r8', measuredHz: 6.56e9 }
];

async function measuredPatchStudy(): Promise<string[]> {
	const lines = [
		'| row | measured GHz | S11 minimum GHz | error | S11 there dB | largest Re Zin GHz | error | Re Zin Ω | reactance zero GHz | cells | seconds |',
		'| --- | ---: | ---: | ---: | ---: | ---: | ---: | ---: | ---: | ---: | ---: |'
	];
	const err = (hz: number | null | undefined, measured: number) => (hz ? `${(((hz - measured) / measured) * 100).toFixed(2)} %` : '—');
	for (const p of MEASURED_PATCHES) {
		console.error(`measured patch ${p.row}, standard…`);
		const input = JSON.parse(readFileSync(join(rootDir, 'tests/fixtures', p.dir, 'input.json'), 'utf8'));
		const r = await runFieldCheck(input, { mode: 'standard', budgetSeconds: 7200 }, { threads: 1 });
		const z = impedanceResonance(r.samples, r.resonance?.frequencyHz ?? p.measuredHz);
		lines.push(
			`| ${p.row} | ${ghz(p.measuredHz)} | ${ghz(r.resonance?.frequencyHz)} | ${err(r.resonance?.frequencyHz, p.measuredHz)} | ${r.resonance ? r.resonance.s11Db.toFixed(1) : '—'} | ${ghz(z.maxResistanceHz)} | ${err(z.maxResistanceHz, p.measuredHz)} | ${z.maxResistanceOhm.toFixed(0)} | ${ghz(z.zeroReactanceHz)} | ${r.mesh.cellCount} | ${r.runSeconds.toFixed(0)} |`
		);
		console.error(lines[lines.length - 1]);
	}
	return lines;
}
