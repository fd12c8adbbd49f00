// `npm run bench -- --fullwave [--cases a,b] [--skip-homing]`: Field check timings on the real openEMS, printed as Markdown.
// Standard and accurate mode per case (accurate's shift is the mesh-convergence figure), then one Homing study (quick mode).
import { readFileSync } from 'node:fs';
import { cpus } from 'node:os';
import { join } from 'node:path';
import { rootDir } from '../lib/config.ts';
import { ensureOpenEms } from '../lib/openems.ts';
import { runFieldCheck, runHoming } from '../../src/worker/fullwave/index.ts';
import type { FieldCheckResult } from '../../src/lib/schemas/field-check.ts';

const CASES = ['rectangular-inset', 'rectangular-probe', 'circular-probe'];

const fixture = (name: string) => JSON.parse(readFileSync(join(rootDir, 'tests/fixtures/simulation', name, 'input.json'), 'utf8'));
const ghz = (hz: number | null | undefined) => (hz ? (hz / 1e9).toFixed(4) : '—');
const pct = (f: number | null | undefined) => (f === null || f === undefined ? '—' : `${(f * 100).toFixed(2)} %`);

function row(name: string, mode: string, r: FieldCheckResult): string {
	return `| ${name} | ${mode} | ${ghz(r.resonance?.frequencyHz)} | ${pct(r.deviationFraction)} | ${r.resonance ? r.resonance.s11Db.toFixed(1) : '—'} | ${r.mesh.cellCount} | ${r.mesh.timesteps} | ${r.runSeconds.toFixed(0)} | ${r.refinement ? pct(r.refinement.shiftFraction) : '—'} |`;
}

export async function runFullwaveBench(argv: string[]): Promise<void> {
	if (!ensureOpenEms()) throw new Error('openEMS is needed for the Field check benchmark');
	const casesArg = argv.indexOf('--cases');
	const cases = casesArg >= 0 ? argv[casesArg + 1].split(',') : CASES;
	const lines = [
		`Field check on openEMS, ${cpus().length} cores (${cpus()[0]?.model ?? 'unknown CPU'}), Node.js ${process.version}, ${new Date().toISOString().slice(0, 10)}.`,
		'',
		'| case | mode | resonance GHz | from target | S11 at resonance dB | cells | timesteps | seconds | shift on 1.5× refinement |',
		'| --- | --- | ---: | ---: | ---: | ---: | ---: | ---: | ---: |'
	];
	for (const name of cases) {
		for (const mode of ['quick', 'standard', 'accurate'] as const) {
			if (mode !== 'quick' && argv.includes('--quick-only')) continue;
			console.error(`${name}, ${mode}…`);
			const r = await runFieldCheck(fixture(name), { mode, budgetSeconds: 7200 }, {});
			lines.push(row(name, mode, r));
			console.error(lines[lines.length - 1]);
		}
	}
	if (!argv.includes('--skip-homing')) {
		console.error('Homing, rectangular-inset, quick…');
		const started = performance.now();
		const h = await runHoming(fixture('rectangular-inset'), { mode: 'quick', budgetSeconds: 7200 }, {});
		const seconds = (performance.now() - started) / 1000;
		lines.push('', `Homing (quick mode, rectangular-inset): ${h.iterations.length} rows, ${h.iterations[h.iterations.length - 1]?.simulations ?? 0} simulations, ${seconds.toFixed(0)} s; ${h.converged ? 'converged' : 'not converged'}: ${h.stoppedBecause}.`);
		lines.push('', '| step | parameter | value mm | resonance GHz | S11 at target dB |', '| ---: | --- | ---: | ---: | ---: |');
		for (const it of h.iterations) lines.push(`| ${it.step} | ${it.parameter} | ${it.value.toFixed(3)} | ${ghz(it.resonanceHz)} | ${it.s11AtTargetDb.toFixed(1)} |`);
	}
	console.log(lines.join('\n'));
}
