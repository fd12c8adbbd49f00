// `npm run cli -- measure`: spawns the real CLI on Touchstone files written for the occasion.
import { spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { writeTouchstone, type TouchstoneNetwork } from '../../../src/lib/formats/touchstone/index';
import { resonantFrequencyHz } from '../../../src/lib/rf/resonant-frequency';
import type { DesignInputDocument } from '../../../src/lib/schemas';
import { sizeDocument } from '../../fixtures/designs/size-document';

const ROOT = resolve(__dirname, '../../..');
let dir: string;

function cli(...args: string[]) {
	const r = spawnSync('npx', ['tsx', 'src/cli/main.ts', 'measure', ...args], { cwd: ROOT, encoding: 'utf8' });
	return { code: r.status, stdout: r.stdout, stderr: r.stderr };
}

/** Γ of a series RLC resonator (R = 40 Ω, Q = 30) on a 50 Ω line: its |S11| minimum sits exactly at f0. */
function seriesRlc(frequencyHz: number, resonanceHz: number) {
	const r = 40;
	const x = 30 * r * (frequencyHz / resonanceHz - resonanceHz / frequencyHz);
	const nr = r - 50;
	const dr = r + 50;
	const d = dr * dr + x * x;
	return { re: (nr * dr + x * x) / d, im: (x * dr - nr * x) / d };
}

function sweepNetwork(resonanceHz: number, startHz: number, stepHz: number, count: number): TouchstoneNetwork {
	return {
		version: '1',
		portCount: 1,
		frequencyUnit: 'MHz',
		format: 'DB',
		referenceImpedanceOhm: [50],
		points: Array.from({ length: count }, (_, i) => {
			const frequencyHz = startHz + i * stepHz;
			return { frequencyHz, s: [seriesRlc(frequencyHz, resonanceHz)] };
		}),
		noise: []
	};
}

const design: DesignInputDocument = { name: 'Demo 2.45 GHz patch', frequencyHz: 2.45e9, substrate: { relativePermittivity: 4.4, heightMm: 1.6 } };
/** The designed patch built on a laminate of εr 4.65 instead of 4.4 (demo numbers). */
const TRUE_ER = 4.65;
const measuredHz = resonantFrequencyHz(sizeDocument(design).patch, { relativePermittivity: TRUE_ER, heightMm: 1.6 });

beforeAll(() => {
	dir = mkdtempSync(join(tmpdir(), 'measure-cli-'));
	writeFileSync(join(dir, 'board.s1p'), writeTouchstone(sweepNetwork(measuredHz, 2.2e9, 1e6, 401), { comments: ['demo measurement'] }));
	writeFileSync(join(dir, 'board-v2.ts'), writeTouchstone(sweepNetwork(measuredHz, 2.2e9, 1e6, 401), { version: '2.0', format: 'RI' }));
	const mismatched = sweepNetwork(2.4e9, 2.3e9, 1e6, 201);
	mismatched.points = mismatched.points.map((p) => ({ ...p, s: [{ re: 0.6 * p.s[0].re + 0.4, im: 0.6 * p.s[0].im }] }));
	writeFileSync(join(dir, 'poor.s1p'), writeTouchstone(mismatched));
	writeFileSync(join(dir, 'bad.s1p'), '! demo\n# GHz S MA R 50\n2.40 0.5 0\n2.45 0.1\n2.50 0.5 0\n');
	writeFileSync(join(dir, 'design.json'), JSON.stringify(design));
	writeFileSync(join(dir, 'bad-design.json'), JSON.stringify({ ...design, substrate: { relativePermittivity: 0.5, heightMm: 1.6 } }));
	writeFileSync(join(dir, 'not-json.json'), '{ frequencyHz: ');
});

afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe('measure', () => {
	it('prints the resonance, the −10 dB edges, the minimum VSWR and the fractional bandwidth', () => {
		const r = cli(join(dir, 'board.s1p'));
		expect(r.stderr).toBe('');
		expect(r.code).toBe(0);
		const out = JSON.parse(r.stdout);
		expect(Math.abs(out.resonance.frequencyHz - measuredHz)).toBeLessThan(1e6);
		expect(out.band.reached).toBe(true);
		expect(out.band.lowerHz).toBeLessThan(measuredHz);
		expect(out.band.upperHz).toBeGreaterThan(measuredHz);
		expect(out.minimumVswr).toBeCloseTo(1.25, 2); // 50/40
		expect(out.fractionalBandwidth).toBeCloseTo(out.band.bandwidthHz / out.band.centreHz, 12);
		expect(out.touchstone).toMatchObject({ version: '1', portCount: 1, pointCount: 401 });
		expect(out.retune).toBeUndefined();
	});

	it('with --design proposes a retune that brings the board back to the target within 0.5 %', () => {
		const r = cli(join(dir, 'board.s1p'), '--design', join(dir, 'design.json'));
		expect(r.code).toBe(0);
		const { retune } = JSON.parse(r.stdout);
		expect(retune.apparentRelativePermittivity).toBeCloseTo(TRUE_ER, 2);
		const rebuilt = sizeDocument(retune.input);
		const newHz = resonantFrequencyHz(rebuilt.patch, { relativePermittivity: TRUE_ER, heightMm: 1.6 });
		expect(Math.abs(newHz / design.frequencyHz - 1)).toBeLessThan(0.005);
		expect(retune.dimensions.map((d: { name: string }) => d.name)).toContain('patch.lengthMm');
	});

	it('reads a version 2.0 file the same way', () => {
		const r = cli(join(dir, 'board-v2.ts'));
		expect(r.code).toBe(0);
		const out = JSON.parse(r.stdout);
		expect(out.touchstone.version).toBe('2.0');
		expect(Math.abs(out.resonance.frequencyHz - measuredHz)).toBeLessThan(1e6);
	});

	it('says when the curve never reaches −10 dB', () => {
		const r = cli(join(dir, 'poor.s1p'));
		expect(r.code).toBe(0);
		const out = JSON.parse(r.stdout);
		expect(out.band.reached).toBe(false);
		expect(out.fractionalBandwidth).toBeNull();
		expect(out.band.message).toMatch(/never reaches -10 dB/);
	});

	it('exits 2 on a malformed file with its line-numbered error on one stderr line', () => {
		const r = cli(join(dir, 'bad.s1p'));
		expect(r.code).toBe(2);
		expect(r.stdout).toBe('');
		const lines = r.stderr.trimEnd().split('\n');
		expect(lines).toHaveLength(1);
		expect(lines[0]).toContain('bad.s1p: line 4:');
		expect(lines[0]).toContain('expected 3 values on a 1-port data line');
	});

	it('exits 2 for a missing file, a bad design and unreadable JSON, one line each', () => {
		for (const [args, pattern] of [
			[[join(dir, 'nope.s1p')], /cannot be read/],
			[[join(dir, 'board.s1p'), '--design', join(dir, 'bad-design.json')], /bad-design\.json: substrate\.relativePermittivity: 0\.5 — .*allowed range/],
			[[join(dir, 'board.s1p'), '--design', join(dir, 'not-json.json')], /not valid JSON/],
			[[join(dir, 'board.s1p'), '--frobnicate'], /unknown option/],
			[[], /a Touchstone file is required/]
		] as [string[], RegExp][]) {
			const r = cli(...args);
			expect(r.code, args.join(' ')).toBe(2);
			expect(r.stderr.trimEnd().split('\n'), args.join(' ')).toHaveLength(1);
			expect(r.stderr).toMatch(pattern);
		}
	});

	it('prints its help', () => {
		const r = cli('--help');
		expect(r.code).toBe(0);
		expect(r.stdout).toMatch(/--design FILE/);
	});
});
