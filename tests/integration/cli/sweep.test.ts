// `cli sweep` in a fresh tsx process: a document valid against the published schema (ajv 2020), exit 2 over the limit.
import Ajv2020 from 'ajv/dist/2020';
import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { sweepJsonSchema } from '../../../src/lib/formats/sweep';
import { designDocument } from '../../fixtures/designs/design-cases';

function cli(args: string[]) {
	const r = spawnSync('npx', ['tsx', 'src/cli/main.ts', 'sweep', ...args], { cwd: process.cwd(), encoding: 'utf8' });
	return { code: r.status, out: r.stdout, err: r.stderr };
}
const dir = mkdtempSync(join(tmpdir(), 'ff-sweep-'));
const design = join(dir, 'design.json');
writeFileSync(design, JSON.stringify(designDocument('circular', 'probe')));

describe('cli sweep', () => {
	it('writes a sweep that validates against the published schema', () => {
		const plan = join(dir, 'plan.json');
		writeFileSync(plan, JSON.stringify({ axes: [{ field: 'substrate.relativePermittivity', from: 2.2, to: 4.4, step: 1.1 }] }));
		const out = join(dir, 'sweep.json');
		const r = cli([design, '--plan', plan, '--out', out]);
		expect(r.err).toBe('');
		expect(r.code).toBe(0);
		const doc = JSON.parse(readFileSync(out, 'utf8'));
		const validate = new Ajv2020({ allErrors: true, strict: false }).compile(sweepJsonSchema as object);
		expect(validate(doc)).toBe(true);
		expect(doc.pointCount).toBe(3);
		expect(doc).toMatchObject({ formatVersion: 2, $schema: '/schemas/sweep-v2.json' });
	});

	it('--mode hold-geometry keeps the radius across an εr sweep that resize changes', () => {
		const plan = join(dir, 'plan-er.json');
		writeFileSync(plan, JSON.stringify({ axes: [{ field: 'substrate.relativePermittivity', values: [3.3, 3.8] }] }));
		const radii = (mode: string) => {
			const out = join(dir, `sweep-${mode}.json`);
			const r = cli([design, '--plan', plan, '--out', out, '--mode', mode]);
			expect(r.code).toBe(0);
			const doc = JSON.parse(readFileSync(out, 'utf8'));
			expect(doc.plan.mode).toBe(mode);
			return doc.points.map((p: { derived: { patch: { radiusMm: number } } }) => p.derived.patch.radiusMm);
		};
		const held = radii('hold-geometry');
		expect(held[0]).toBe(held[1]);
		const resized = radii('resize');
		expect(resized[0]).toBeGreaterThan(resized[1]);
	});

	it('exits 2 naming an unknown --mode', () => {
		const r = cli([design, '--plan', join(dir, 'plan.json'), '--out', join(dir, 'y.json'), '--mode', 'keep']);
		expect(r.code).toBe(2);
		expect(r.err.trim()).toBe('--mode must be one of: resize, hold-geometry; got "keep"');
	});

	it('exits 2 with one line and writes nothing for a plan over 10 000 points', () => {
		const plan = join(dir, 'big.json');
		writeFileSync(plan, JSON.stringify({ axes: [{ field: 'frequencyHz', values: [1e9, 2e9] }, { field: 'substrate.heightMm', from: 0.1, to: 3, step: 0.0001 }] }));
		const out = join(dir, 'never.json');
		const r = cli([design, '--plan', plan, '--out', out]);
		expect(r.code).toBe(2);
		expect(r.err.trim().split('\n').length).toBe(1);
		expect(r.err).toMatch(/^plan\.axes: \d+ — the plan makes \d+ points; allowed range \[1, 10000\]/);
		expect(existsSync(out)).toBe(false);
	});

	it('exits 2 naming a missing plan option', () => {
		const r = cli([design, '--out', join(dir, 'x.json')]);
		expect(r.code).toBe(2);
		expect(r.err.trim()).toBe('--plan plan.json is required');
	});
});
