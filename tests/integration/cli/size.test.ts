import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { parseDesignInput } from '../../../src/lib/schemas';

function cli(args: string[], stdin?: string) {
	const r = spawnSync('npx', ['tsx', 'src/cli/main.ts', 'size', ...args], { cwd: process.cwd(), encoding: 'utf8', input: stdin });
	return { code: r.status, out: r.stdout, err: r.stderr };
}

const flags = ['--frequency-ghz', '2.45', '--er', '4.4', '--height-mm', '1.6', '--loss-tangent', '0.02'];

describe('cli size', () => {
	it('prints one JSON object with the complete input and every quantity with its unit in the key', () => {
		const r = cli(flags);
		expect(r.code).toBe(0);
		const report = JSON.parse(r.out);
		// The echoed input is itself a complete, valid design-input document.
		expect(parseDesignInput(report.input)).toEqual(report.input);
		for (const key of ['patchWidthMm', 'patchLengthMm', 'effectivePermittivity', 'fringeExtensionMm', 'effectiveLengthMm', 'slotConductanceS', 'mutualConductanceS', 'edgeResistanceOhm', 'insetDepthMm', 'feedLineWidthMm', 'groundWidthMm', 'groundLengthMm']) {
			expect(typeof report[key], key).toBe('number');
		}
		expect(report.estimates.bandwidthFraction).toBeGreaterThan(0);
		expect(report.estimates.note).toMatch(/Estimates/);
		expect(Array.isArray(report.warnings)).toBe(true);
		// Ground = patch + 6h by default (common practice, no source).
		expect(report.groundWidthMm).toBeCloseTo(report.patchWidthMm + 6 * 1.6, 9);
	});

	it('reports the transformer for a quarter-wave feed and honours the ground margin flag', () => {
		const r = cli([...flags, '--feed', 'quarter-wave', '--ground-margin-mm', '2', '--copper-um', '18', '--target-ohm', '50']);
		expect(r.code).toBe(0);
		const report = JSON.parse(r.out);
		expect(report.transformerImpedanceOhm).toBeCloseTo(Math.sqrt(50 * report.edgeResistanceOhm), 6);
		expect(report.transformerLengthMm).toBeGreaterThan(0);
		expect(report.groundWidthMm).toBeCloseTo(report.patchWidthMm + 4, 9);
		expect(report.input.substrate.copperThicknessUm).toBe(18);
	});

	it('reads a design file and lets flags override it; picks a probe for a circular patch', () => {
		const dir = mkdtempSync(join(tmpdir(), 'ff-size-'));
		const file = join(dir, 'design.json');
		writeFileSync(file, JSON.stringify({ frequencyHz: 5.8e9, substrate: { relativePermittivity: 3.55, heightMm: 0.813 } }));
		const r = cli([file, '--shape', 'circular']);
		expect(r.code).toBe(0);
		const report = JSON.parse(r.out);
		expect(report.input.frequencyHz).toBe(5.8e9);
		expect(report.feed).toBe('probe');
		expect(report.patchRadiusMm).toBeGreaterThan(0);
		expect(report.probeOffsetMm).toBeGreaterThan(0);
	});

	it('reads the document from stdin with -', () => {
		const r = cli(['-'], JSON.stringify({ frequencyHz: 10e9, substrate: { relativePermittivity: 2.2, heightMm: 1.588 } }));
		expect(r.code).toBe(0);
		expect(JSON.parse(r.out).patchWidthMm).toBeCloseTo(11.85, 1);
	});

	// Each row: arguments, the one stderr line must name this field and this value.
	const bad: [string[], RegExp][] = [
		[['--frequency-ghz', '2.45', '--er', '0.9', '--height-mm', '1.6'], /^substrate\.relativePermittivity: 0\.9 — allowed range \(1, 30\]$/],
		[['--frequency-ghz', '2.45', '--er', 'abc', '--height-mm', '1.6'], /^substrate\.relativePermittivity: "abc" — must be a finite number/],
		[['--frequency-ghz', '0.05', '--er', '4.4', '--height-mm', '1.6'], /^frequencyHz: 50000000 — allowed range/],
		[['--frequency-ghz', '2.45', '--er', '4.4'], /^substrate\.heightMm: missing — required/],
		[['--frequency-ghz', '2.45', '--er', '4.4', '--height-mm', '1.6', '--target-ohm', '500'], /^targetImpedanceOhm: 500 — allowed range \[10, 200\]$/],
		[['--frequency-ghz', '2.45', '--er', '4.4', '--height-mm', '1.6', '--bogus', '1'], /^--bogus: unknown flag/]
	];
	it.each(bad)('exits 2 with one line naming field, value and range for %j', (args, line) => {
		const r = cli(args);
		expect(r.code).toBe(2);
		expect(r.out).toBe('');
		const lines = r.err.trim().split('\n');
		expect(lines).toHaveLength(1);
		expect(lines[0]).toMatch(line);
	});

	it('documents every flag in --help', () => {
		const r = cli(['--help']);
		expect(r.code).toBe(0);
		for (const flag of ['--shape', '--feed', '--frequency-ghz', '--er', '--height-mm', '--loss-tangent', '--target-ohm', '--copper-um', '--ground-margin-mm']) expect(r.out).toContain(flag);
	});
});

describe('cli size: a CP design with a band to cover', () => {
	const doc = { name: 'FPV', frequencyHz: 5.8e9, shape: 'truncated-corner', feed: 'inset', substrate: { relativePermittivity: 2.2, heightMm: 0.787, lossTangent: 0.001 }, bandToCover: { lowerHz: 5.725e9, upperHz: 5.875e9 } };

	it('prints the circularPolarisation bands, echoes bandToCover in the input and warns band-not-covered', () => {
		const r = cli(['-'], JSON.stringify(doc));
		expect(r.code).toBe(0);
		const report = JSON.parse(r.out);
		expect(report.input.bandToCover).toEqual(doc.bandToCover);
		const cp = report.circularPolarisation;
		expect(cp.axialRatioBandLowerHz).toBeLessThan(5.8e9);
		expect(cp.axialRatioBandUpperHz).toBeGreaterThan(5.8e9);
		expect(cp.usableBandUpperHz - cp.usableBandLowerHz).toBeLessThan(doc.bandToCover.upperHz - doc.bandToCover.lowerHz);
		expect(report.warnings.map((w: { code: string }) => w.code)).toContain('band-not-covered');
	});

	it('refuses a band whose upper edge is below its lower edge with exit code 2, naming the field', () => {
		const r = cli(['-'], JSON.stringify({ ...doc, bandToCover: { lowerHz: 5.875e9, upperHz: 5.725e9 } }));
		expect(r.code).toBe(2);
		expect(r.err).toContain('bandToCover.upperHz');
	});
});
