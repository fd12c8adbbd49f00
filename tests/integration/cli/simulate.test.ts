// `npm run cli -- simulate`: argument handling and exit codes, with the engine swapped for a missing one (no simulation runs).
import { spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { FieldCheckResult } from '../../../src/lib/schemas/field-check';

const ROOT = resolve(__dirname, '../../..');
let dir: string;

function cli(args: string[], env: NodeJS.ProcessEnv = {}) {
	const r = spawnSync('npx', ['tsx', 'src/cli/main.ts', 'simulate', ...args], { cwd: ROOT, encoding: 'utf8', env: { ...process.env, ...env } });
	return { code: r.status, stdout: r.stdout, stderr: r.stderr };
}

describe('cli simulate', () => {
	beforeAll(() => {
		dir = mkdtempSync(join(tmpdir(), 'ff-simulate-'));
		writeFileSync(join(dir, 'good.json'), JSON.stringify({ frequencyHz: 2.45e9, feed: 'inset', substrate: { relativePermittivity: 4.3, heightMm: 1.6 } }));
		writeFileSync(join(dir, 'bad.json'), JSON.stringify({ frequencyHz: 2.45e9, substrate: { relativePermittivity: 0.5, heightMm: 1.6 } }));
		writeFileSync(join(dir, 'layered.json'), JSON.stringify({ frequencyHz: 2.45e9, feed: 'inset', array: { columns: 2 }, substrate: { relativePermittivity: 4.3, heightMm: 1.6 } }));
	});
	afterAll(() => rmSync(dir, { recursive: true, force: true }));

	it('documents the engine-missing exit code in --help', () => {
		const r = cli(['--help']);
		expect(r.code).toBe(0);
		expect(r.stdout).toMatch(/4 the openEMS engine is not installed/);
		expect(r.stdout).toMatch(/--tune/);
	});

	it('exits 2 naming the field for a bad document', () => {
		const r = cli([join(dir, 'bad.json'), '--quick']);
		expect(r.code).toBe(2);
		expect(r.stderr).toMatch(/substrate\.relativePermittivity/);
	});

	it('exits 2 for a design the model cannot hold (an array)', () => {
		const r = cli([join(dir, 'layered.json'), '--quick']);
		expect(r.code).toBe(2);
		expect(r.stderr).toMatch(/arrays are not modelled/);
	});

	it('exits 2 for conflicting or unknown options', { timeout: 120_000 }, () => {
		expect(cli([join(dir, 'good.json'), '--quick', '--accurate']).code).toBe(2);
		expect(cli([join(dir, 'good.json'), '--fast']).code).toBe(2);
		expect(cli([]).code).toBe(2);
		expect(cli([join(dir, 'missing.json')]).code).toBe(2);
	});

	it('exits 4 and says how to install the engine when openEMS is missing', () => {
		const r = cli([join(dir, 'good.json'), '--quick'], { FRINGEFIELD_OPENEMS: '/nonexistent/openEMS' });
		expect(r.code).toBe(4);
		expect(r.stderr).toMatch(/apt-get install openems/);
	});
});

describe('cli simulate: the printed summary', () => {
	const base: FieldCheckResult = {
		engine: { name: 'openEMS', version: '0.0.35' },
		mode: 'quick',
		targetFrequencyHz: 2.45e9,
		referenceImpedanceOhm: 50,
		mesh: { cellsX: 2, cellsY: 2, cellsZ: 2, cellCount: 8, smallestCellMm: 0.4, largestCellMm: 4, timesteps: 10 },
		energyDecayDb: -40,
		runSeconds: 1,
		samples: [
			{ frequencyHz: 2.4e9, s11Re: 0.1, s11Im: 0, resistanceOhm: 61, reactanceOhm: 0 },
			{ frequencyHz: 2.5e9, s11Re: 0.2, s11Im: 0, resistanceOhm: 75, reactanceOhm: 0 }
		],
		resonance: null,
		deviationFraction: null,
		s11AtTargetDb: -15,
		band: null,
		minimumVswr: 1.2,
		pattern: null,
		refinement: null
	};

	it('prints the far field’s broadside figures (not the cuts) under farField, and null when there is none', async () => {
		const { summaryOf } = await import('../../../src/cli/commands/simulate');
		const { analyzeFarField, FAR_FIELD_PHI_DEG, FAR_FIELD_THETA_DEG } = await import('../../../src/lib/simulation');
		expect(summaryOf(base).farField).toBeNull();
		// a short dipole along y (D = 1.5, Balanis, Antenna Theory 4th ed., §4.2; standard result) with half its accepted power radiated
		const n = FAR_FIELD_THETA_DEG.length * FAR_FIELD_PHI_DEG.length;
		const eThetaRe = new Float64Array(n);
		const ePhiRe = new Float64Array(n);
		FAR_FIELD_PHI_DEG.forEach((p, j) =>
			FAR_FIELD_THETA_DEG.forEach((t, i) => {
				eThetaRe[j * FAR_FIELD_THETA_DEG.length + i] = Math.cos((t * Math.PI) / 180) * Math.sin((p * Math.PI) / 180);
				ePhiRe[j * FAR_FIELD_THETA_DEG.length + i] = Math.cos((p * Math.PI) / 180);
			})
		);
		const sphere = { frequencyHz: 2.45e9, radiusM: 1, thetaDeg: FAR_FIELD_THETA_DEG, phiDeg: FAR_FIELD_PHI_DEG, eThetaRe, eThetaIm: new Float64Array(n), ePhiRe, ePhiIm: new Float64Array(n) };
		const radiated = analyzeFarField(sphere, null).radiatedPowerW;
		const pattern = analyzeFarField(sphere, 2 * radiated);
		const printed = summaryOf({ ...base, pattern }).farField!;
		expect(printed.directivityDbi).toBeCloseTo(1.76, 2);
		expect(printed.gainDbi).toBeCloseTo(1.76 - 3.01, 2);
		expect(printed.radiationEfficiency).toBeCloseTo(0.5, 9);
		expect(printed.ePlanePhiDeg).toBe(90);
		expect(Object.keys(printed)).not.toContain('ePlane');
	});
});
