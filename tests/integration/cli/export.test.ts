// `cli export` in a fresh tsx process: the files the shared pipeline makes, the same bytes as in-process, exit 2 on bad input,
// exit 3 with the violations unless --waive (which lands in the fab notes); the read-back self-check in-process with a test-only hook.
import { spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { existsSync, mkdtempSync, readFileSync, readdirSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it, vi } from 'vitest';
import Ajv2020 from 'ajv/dist/2020';
import * as exportCommand from '../../../src/cli/commands/export';
import { sweepJsonSchema } from '../../../src/lib/formats/sweep/schema';
import { STANDARD_QUICK_TURN_PROFILE } from '../../../src/lib/schemas/fab-profile';
import { goldenBundle, goldenDesign } from '../../fixtures/bundle/golden-bundle';

function cli(args: string[]) {
	const r = spawnSync('npx', ['tsx', 'src/cli/main.ts', 'export', ...args], { cwd: process.cwd(), encoding: 'utf8' });
	return { code: r.status, out: r.stdout, err: r.stderr };
}
const dir = mkdtempSync(join(tmpdir(), 'ff-export-'));
const design = join(dir, 'design.json');
writeFileSync(design, JSON.stringify(goldenDesign));
const sha = (b: Uint8Array) => createHash('sha256').update(b).digest('hex');

describe('cli export', () => {
	it('writes the same zip bytes as the in-process pipeline (the golden bundle)', async () => {
		const out = join(dir, 'bundle.zip');
		const r = cli([design, '--out', out, '--revision', 'B', '--date', '2026-11-20']);
		expect(r.err).toBe('');
		expect(r.code).toBe(0);
		expect(sha(readFileSync(out))).toBe(sha(await goldenBundle()));
	});

	it('writes only the chosen formats into a folder, with the manifest', () => {
		const out = join(dir, 'files');
		const r = cli([design, '--out', out, '--formats', 'gerber,drill', '--revision', 'B', '--date', '2026-11-20']);
		expect(r.code).toBe(0);
		expect(readdirSync(out).sort()).toEqual(
			['copper-bottom.gbr', 'copper-top.gbr', 'drill-plated.drl', 'manifest.json', 'mask-bottom.gbr', 'mask-top.gbr', 'profile.gbr'].map((s) => `sunroof-gnss-B.${s}`).sort()
		);
	});

	it.each([
		// a field out of range in the design
		{ name: 'an out-of-range design field', doc: { ...goldenDesign, frequencyHz: 5 }, extra: [], pattern: /^frequencyHz: 5 — .*allowed range/ },
		// an unknown format
		{ name: 'an unknown format', doc: goldenDesign, extra: ['--formats', 'gerber,pdf'], pattern: /^--formats: "pdf" — must be/ },
		// an impossible date
		{ name: 'a bad revision date', doc: goldenDesign, extra: ['--date', '2026-02-30'], pattern: /^date: "2026-02-30" — / }
	])('exits 2 with one line and writes nothing for $name', ({ doc, extra, pattern }) => {
		const file = join(dir, `bad-${Math.abs(JSON.stringify(doc).length)}.json`);
		writeFileSync(file, JSON.stringify(doc));
		const out = join(dir, `never-${extra.join('') || 'x'}.zip`);
		const r = cli([file, '--out', out, ...extra]);
		expect(r.code).toBe(2);
		expect(r.err.trim().split('\n').length).toBe(1);
		expect(r.err.trim()).toMatch(pattern);
		expect(existsSync(out)).toBe(false);
	});
});

describe('cli export: the design-rule gate and the read-back self-check', () => {
	// The golden design with a 0.15 mm inset notch gap: under the built-in 0.2 mm minimum slot, one violation per side.
	const narrow = join(dir, 'narrow-notch.json');
	writeFileSync(narrow, JSON.stringify({ ...goldenDesign, feed: 'inset', inset: { notchGapMm: 0.15 } }));
	// A profile whose smallest drill (2 mm) is larger than the golden design's 1.3 mm probe hole.
	const coarse = join(dir, 'coarse-profile.json');
	writeFileSync(coarse, JSON.stringify({ ...STANDARD_QUICK_TURN_PROFILE, name: 'coarse test fab', minDrillMm: 2 }));

	it('refuses a violating design with exit 3, the violations as JSON on stdout, and writes nothing', () => {
		const out = join(dir, 'refused.zip');
		const r = cli([narrow, '--out', out]);
		expect(r.code).toBe(3);
		const body = JSON.parse(r.out);
		expect(body.clean).toBe(false);
		expect(body.profile).toEqual(STANDARD_QUICK_TURN_PROFILE);
		expect(body.violations.map((v: { ruleId: string }) => v.ruleId)).toEqual(['slot-width', 'slot-width']);
		expect(body.violations[0]).toMatchObject({ layerId: 'copper-top', requiredMm: 0.2 });
		expect(r.err.trim().split('\n')).toHaveLength(1);
		expect(existsSync(out)).toBe(false);
	});

	it('checks against --profile: a minimum drill above the probe hole fires drill-size on the clean golden design', () => {
		const out = join(dir, 'coarse-out');
		const r = cli([design, '--out', out, '--profile', coarse]);
		expect(r.code).toBe(3);
		const body = JSON.parse(r.out);
		expect(body.profile.name).toBe('coarse test fab');
		expect(body.violations.map((v: { ruleId: string; measuredMm: number }) => [v.ruleId, v.measuredMm])).toEqual([['drill-size', 1.3]]);
		expect(existsSync(out)).toBe(false);
	});

	it('exports a violating design given --waive, the reason and each waived violation in the fab notes', () => {
		const out = join(dir, 'waived');
		const r = cli([narrow, '--out', out, '--formats', 'drill,notes', '--waive', 'Board house confirmed 0.15 mm gaps', '--revision', 'C', '--date', '2026-11-21']);
		expect(r.err).toBe('');
		expect(r.code).toBe(0);
		expect(r.out).toMatch(/2 violation\(s\) waived/);
		const notes = readFileSync(join(out, 'sunroof-gnss-C.fab-notes.txt'), 'utf8');
		expect(notes).toContain(`   - DESIGN-RULE WAIVER: 2 design-rule violations against the "${STANDARD_QUICK_TURN_PROFILE.name}" profile accepted by the design team. Reason: "Board house confirmed 0.15 mm gaps"`);
		expect(notes.match(/^ {3}- Waived: /gm)).toHaveLength(2);
	});

	it('leaves a clean design’s bytes alone when --waive is given (nothing to waive): still the golden bundle', async () => {
		const out = join(dir, 'clean-waived.zip');
		const r = cli([design, '--out', out, '--revision', 'B', '--date', '2026-11-20', '--waive', 'no reason needed']);
		expect(r.code).toBe(0);
		expect(sha(readFileSync(out))).toBe(sha(await goldenBundle()));
	});

	it('exits 2 with one line for a waiver without a real reason', () => {
		const r = cli([narrow, '--out', join(dir, 'never-w'), '--waive', ' ok ']);
		expect(r.code).toBe(2);
		expect(r.err.trim()).toMatch(/^--waive: " ok " — must say why/);
	});

	it('exits 1 with a support id and writes nothing when a Gerber fails its read-back (test-only corruption)', async () => {
		const out = join(dir, 'corrupt-out');
		const errors: string[] = [];
		const spyErr = vi.spyOn(console, 'error').mockImplementation((...a: unknown[]) => void errors.push(a.join(' ')));
		const spyLog = vi.spyOn(console, 'log').mockImplementation(() => undefined);
		try {
			// shift every coordinate of the top copper by 1 mm in x: a writer bug a fab would build
			const corruptFiles = (files: { name: string; bytes: Uint8Array }[]) =>
				files.map((f) => (f.name.endsWith('.copper-top.gbr') ? { name: f.name, bytes: new TextEncoder().encode(new TextDecoder().decode(f.bytes).replace(/^X(-?\d+)Y/gm, (_, x: string) => `X${BigInt(x) + 1_000_000n}Y`)) } : f));
			const code = await exportCommand.run([design, '--out', out, '--formats', 'gerber'], { corruptFiles });
			expect(code).toBe(1);
		} finally {
			spyErr.mockRestore();
			spyLog.mockRestore();
		}
		const last = errors.at(-1)!;
		const supportId = /support id ([0-9a-f-]{36})$/.exec(last)?.[1];
		expect(supportId).toBeDefined();
		const logged = JSON.parse(errors.find((e) => e.startsWith('{'))!);
		expect(logged).toMatchObject({ event: 'export.read-back-mismatch', supportId });
		expect(logged.mismatches.some((m: { layerKey: string }) => m.layerKey === 'copper-L1')).toBe(true);
		expect(existsSync(out)).toBe(false);
	});
});

describe('cli export: the probe model (solid pin or plated barrel) in the drill file, fab notes and sweep stack', () => {
	// ajv 8 (draft 2020-12) is the outside reference for the published sweep schema.
	const validate = new Ajv2020({ allErrors: true, strict: true, strictTypes: false, strictTuples: false }).compile(sweepJsonSchema as object);
	const files = (doc: unknown, tag: string) => {
		const file = join(dir, `probe-${tag}.json`);
		writeFileSync(file, JSON.stringify(doc));
		const out = join(dir, `probe-${tag}`);
		const r = cli([file, '--out', out, '--formats', 'drill,sweep,notes', '--revision', 'B', '--date', '2026-11-20']);
		expect(r.err).toBe('');
		expect(r.code).toBe(0);
		const read = (part: string) => readFileSync(join(out, `sunroof-gnss-B.${part}`), 'utf8');
		return { drill: read('drill-plated.drl'), notes: read('fab-notes.txt'), sweep: JSON.parse(read('design.sweep.json')) };
	};

	it('says nothing about the probe when no model is stated (today’s files)', () => {
		const f = files(goldenDesign, 'none');
		expect(f.drill).not.toMatch(/probe:/);
		expect(f.notes).not.toMatch(/Probe hole/);
		expect(f.sweep.points[0].stack.some((l: { kind: string }) => l.kind === 'probe')).toBe(false);
	});

	it('carries a plated barrel with its plating (default 25 µm) into the drill comment, the notes and the sweep stack', () => {
		const f = files({ ...goldenDesign, probe: { drillDiameterMm: 1.3, clearanceDiameterMm: 4.1, model: 'plated-barrel' } }, 'barrel');
		expect(f.drill).toMatch(/^; probe: plated barrel with 25 um copper wall; finished hole 1\.300 mm$/m);
		expect(f.notes).toContain('   Probe hole: plated barrel, at least 25 µm copper on the hole wall, finished at 1.3 mm.');
		const stack = f.sweep.points[0].stack;
		const probe = stack.at(-1);
		expect(probe).toMatchObject({ kind: 'probe', id: 'probe-drill', model: 'plated-barrel', drillDiameterMm: 1.3, platingThicknessUm: 25, zMm: 0 });
		// it spans the whole stack: the sum of the slabs' thicknesses
		const slabs = stack.filter((l: { kind: string }) => l.kind !== 'probe');
		expect(probe.thicknessMm).toBeCloseTo(slabs.reduce((s: number, l: { thicknessMm: number }) => s + l.thicknessMm, 0), 9);
		expect(validate(f.sweep), JSON.stringify(validate.errors)).toBe(true);
	});

	it('carries a solid pin, and a stated plating thickness, through the same three files', () => {
		const pin = files({ ...goldenDesign, probe: { drillDiameterMm: 1.3, clearanceDiameterMm: 4.1, model: 'solid-pin' } }, 'pin');
		expect(pin.drill).toMatch(/^; probe: solid pin through the 1\.300 mm finished hole$/m);
		expect(pin.notes).toContain('Probe hole: finished at 1.3 mm; a solid connector pin is soldered through it after fabrication.');
		expect(pin.sweep.points[0].stack.at(-1)).toMatchObject({ kind: 'probe', model: 'solid-pin', platingThicknessUm: null });
		expect(validate(pin.sweep), JSON.stringify(validate.errors)).toBe(true);
		const thick = files({ ...goldenDesign, probe: { drillDiameterMm: 1.3, clearanceDiameterMm: 4.1, model: 'plated-barrel', platingThicknessUm: 35 } }, 'thick');
		expect(thick.drill).toContain('; probe: plated barrel with 35 um copper wall');
	});

	it.each([
		// a plating thickness on a solid pin makes no sense
		{ name: 'a plating thickness on a solid pin', probe: { model: 'solid-pin', platingThicknessUm: 25 }, pattern: /^probe\.platingThicknessUm: 25 — only a probe\.model "plated-barrel"/ },
		// an unknown model name
		{ name: 'an unknown model', probe: { model: 'hollow' }, pattern: /^probe\.model: "hollow" — / },
		// plating out of range
		{ name: 'plating out of range', probe: { model: 'plated-barrel', platingThicknessUm: 500 }, pattern: /^probe\.platingThicknessUm: 500 — .*allowed range \[5, 100\]/ }
	])('exits 2 with one line for $name', ({ probe, pattern }) => {
		const file = join(dir, `bad-probe-${probe.model}-${probe.platingThicknessUm ?? 0}.json`);
		writeFileSync(file, JSON.stringify({ ...goldenDesign, probe: { drillDiameterMm: 1.3, clearanceDiameterMm: 4.1, ...probe } }));
		const r = cli([file, '--out', join(dir, 'never-probe')]);
		expect(r.code).toBe(2);
		expect(r.err.trim()).toMatch(pattern);
	});
});
