// `check`: violations as JSON, exit 0 clean / 3 violations / 2 bad input with one stderr line.
import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { STANDARD_QUICK_TURN_PROFILE } from '../../../src/lib/schemas/fab-profile';

const dir = mkdtempSync(join(tmpdir(), 'ff-check-'));
function file(name: string, content: unknown): string {
	const p = join(dir, name);
	writeFileSync(p, typeof content === 'string' ? content : JSON.stringify(content));
	return p;
}
function cli(args: string[]) {
	const r = spawnSync('npx', ['tsx', 'src/cli/main.ts', 'check', ...args], { cwd: process.cwd(), encoding: 'utf8' });
	return { code: r.status, out: r.stdout, err: r.stderr };
}

const fr4 = file('fr4.json', { name: 'FR-4 patch', frequencyHz: 2.45e9, substrate: { relativePermittivity: 4.4, heightMm: 1.6 } });
// a 50 Ω line on 0.1 mm of εr 10.2 is ≈ 0.07 mm wide: below the 0.15 mm minimum trace
const thin = file('thin.json', { frequencyHz: 2.45e9, feed: 'edge', substrate: { relativePermittivity: 10.2, heightMm: 0.1 } });

describe('cli check', () => {
	it('exits 0 with an empty list for a clean design under the built-in profile', () => {
		const r = cli([fr4]);
		expect(r.code).toBe(0);
		const report = JSON.parse(r.out);
		expect(report).toMatchObject({ design: 'FR-4 patch', clean: true, violations: [] });
		expect(report.profile).toEqual(STANDARD_QUICK_TURN_PROFILE);
	});

	it('exits 3 and prints each violation with rule, shapes, location, measured and required', () => {
		const r = cli([thin]);
		expect(r.code).toBe(3);
		const { clean, violations } = JSON.parse(r.out);
		expect(clean).toBe(false);
		expect(violations).toHaveLength(1);
		expect(violations[0]).toMatchObject({ ruleId: 'trace-width', layerId: 'copper-top', shapeIds: ['feed-line'], requiredMm: 0.15 });
		expect(violations[0].measuredMm).toBeLessThan(0.15);
		expect(typeof violations[0].location.xMm).toBe('number');
		expect(violations[0].message).toMatch(/feed-line/);
	});

	it('checks against a given profile: a looser house accepts the thin line', () => {
		const loose = file('loose.json', { ...STANDARD_QUICK_TURN_PROFILE, name: 'fine-line house', minTraceWidthMm: 0.05, minSpacingMm: 0.05, minSlotWidthMm: 0.05 });
		const r = cli([thin, '--profile', loose]);
		expect(r.code).toBe(0);
		expect(JSON.parse(r.out).profile.name).toBe('fine-line house');
	});

	it.each([
		// a profile value out of range names the field and the range
		['a bad profile value', () => [fr4, '--profile', file('bad.json', { ...STANDARD_QUICK_TURN_PROFILE, minDrillMm: -1 })], /^minDrillMm: -1 — allowed range/],
		// a design value out of range
		['a bad design value', () => [file('badd.json', { frequencyHz: 1, substrate: { relativePermittivity: 4.4, heightMm: 1.6 } })], /^frequencyHz: 1 — /],
		// not JSON
		['a file that is not JSON', () => [file('nojson.json', '{')], /not valid JSON/],
		// a missing file
		['a missing file', () => [join(dir, 'absent.json')], /cannot read/],
		// no design at all
		['no design file', () => [], /a design file is required/],
		// an unknown option
		['an unknown option', () => [fr4, '--strict'], /unknown option "--strict"/]
	])('exits 2 with one stderr line for %s', (_name, args, message) => {
		const r = cli(args());
		expect(r.code).toBe(2);
		expect(r.out).toBe('');
		expect(r.err.trim().split('\n')).toHaveLength(1);
		expect(r.err).toMatch(message);
	});
});
