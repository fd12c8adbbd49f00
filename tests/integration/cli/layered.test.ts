// `cli size | export | sweep` with layered and array documents, in fresh tsx processes: reports, files, one-line refusals.
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, readdirSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { layeredDocument, threeCopperStack } from '../../fixtures/designs/layered-cases';

const cli = (args: string[]) => {
	const r = spawnSync('npx', ['tsx', 'src/cli/main.ts', ...args], { cwd: process.cwd(), encoding: 'utf8' });
	return { code: r.status, out: r.stdout, err: r.stderr };
};
const dir = mkdtempSync(join(tmpdir(), 'ff-layered-'));
const designFile = join(dir, 'tile.json');
writeFileSync(designFile, JSON.stringify(layeredDocument({ name: 'Radar tile', feed: 'aperture-coupled', stack: [...threeCopperStack], array: { columns: 4, rows: 2 } })));

describe('cli with layered designs and arrays', () => {
	it('size prints the stack, the coupled feed and the array block', () => {
		const r = cli(['size', designFile]);
		expect(r.code).toBe(0);
		const report = JSON.parse(r.out);
		expect(report.feed).toBe('aperture-coupled');
		expect(report.slotLengthMm).toBeGreaterThan(0);
		expect(report.layerStack.length).toBe(6);
		expect(report.array.elementCount).toBe(8);
		expect(report.array.factor.pattern.anglesDeg.length).toBe(181);
	});

	it('size --columns 6 exits 2 with one line naming the field and the powers of two', () => {
		const r = cli(['size', '--frequency-ghz', '2.45', '--er', '3.55', '--height-mm', '0.8', '--columns', '6']);
		expect(r.code).toBe(2);
		expect(r.err.trim().split('\n').length).toBe(1);
		expect(r.err).toMatch(/^array\.columns: 6 — must be a power of two/);
	});

	it('export writes a Gerber per copper layer, the drawings, the sweep and the array pattern', () => {
		const out = join(dir, 'files');
		const r = cli(['export', designFile, '--out', out]);
		expect(r.err).toBe('');
		expect(r.code).toBe(0);
		expect(readdirSync(out).sort()).toEqual(
			['array-pattern.json', 'copper-bottom.gbr', 'copper-inner-1.gbr', 'copper-top.gbr', 'design.sweep.json', 'drawing.dxf', 'drawing.svg', 'fab-notes.txt', 'manifest.json', 'profile.gbr'].map((f) => `radar-tile-A.${f}`).sort()
		);
		expect(readFileSync(join(out, 'radar-tile-A.copper-inner-1.gbr'), 'utf8')).toContain('%TF.FileFunction,Copper,L2,Inr*%');
	});

	it('sweep varies the array spacing', () => {
		const plan = join(dir, 'plan.json');
		writeFileSync(plan, JSON.stringify({ axes: [{ field: 'array.spacingXWavelengths', values: [0.6, 0.75] }] }));
		const out = join(dir, 'sweep.json');
		const r = cli(['sweep', designFile, '--plan', plan, '--out', out]);
		expect(r.code).toBe(0);
		const doc = JSON.parse(readFileSync(out, 'utf8'));
		expect(doc.points.map((p: { status: string }) => p.status)).toEqual(['sized', 'sized']);
		expect(doc.points[1].derived.array.spacingXWavelengths).toBe(0.75);
	});
});
