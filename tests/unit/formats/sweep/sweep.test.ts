// Sweep documents validated with ajv 8 (draft 2020-12, the outside reference) against the published schema.
import Ajv2020 from 'ajv/dist/2020';
import { describe, expect, it } from 'vitest';
import { createExportMeta } from '../../../../src/lib/formats/export-meta';
import { MAX_SWEEP_POINTS, buildSweepDocument, countSweepPoints, parseSweepPlan, serializeSweep, sweepCombinations, sweepJsonSchema } from '../../../../src/lib/formats/sweep';
import { InputError } from '../../../../src/lib/schemas';
import { designDocument } from '../../../fixtures/designs/design-cases';

const meta = createExportMeta({ designName: 'Sunroof GNSS', revisionLabel: 'B', revisionDate: '2026-11-20' });
const ajv = new Ajv2020({ allErrors: true, strict: true, strictTypes: false, strictTuples: false });
const validate = ajv.compile(sweepJsonSchema as object);

const base = designDocument('rectangular', 'inset');
const plan = { combine: 'grid', axes: [{ field: 'substrate.heightMm', from: 0.8, to: 1.6, step: 0.4 }, { field: 'frequencyHz', values: [2.4e9, 2.5e9] }] };

describe('sweep documents', () => {
	it('validate against the published JSON Schema for every shape and feed', () => {
		for (const [shape, feed] of [['rectangular', 'inset'], ['circular', 'edge'], ['truncated-corner', 'quarter-wave'], ['nearly-square', 'probe']] as const) {
			const doc = JSON.parse(serializeSweep(buildSweepDocument(designDocument(shape, feed, { solderMask: true }), plan, meta)));
			const ok = validate(doc);
			expect(validate.errors ?? []).toEqual([]);
			expect(ok).toBe(true);
			expect(doc.pointCount).toBe(6);
		}
	});

	it('fails validation of a tampered document with field-level errors', () => {
		const doc = JSON.parse(serializeSweep(buildSweepDocument(base, plan, meta)));
		doc.formatVersion = 1;
		doc.points[1].layers[0].shapes[0].geometry.region.outer.start = ['a', 0];
		delete doc.points[2].stack;
		expect(validate(doc)).toBe(false);
		const paths = (validate.errors ?? []).map((e) => e.instancePath);
		expect(paths).toContain('/formatVersion');
		expect(paths).toContain('/points/1/layers/0/shapes/0/geometry/region/outer/start/0');
		expect(validate.errors!.some((e) => e.instancePath === '/points/2' && e.params && (e.params as { missingProperty?: string }).missingProperty === 'stack')).toBe(true);
	});

	it('lists the stack bottom up: bottom copper at z = 0 first, then each slab on the one before it, top copper last', () => {
		const doc = buildSweepDocument(designDocument('rectangular', 'probe', { probe: { drillDiameterMm: 1.3, clearanceDiameterMm: 4.1, model: 'plated-barrel' } }), { axes: [{ field: 'frequencyHz', values: [2.45e9] }] }, meta);
		const point = doc.points[0];
		if (point.status !== 'sized') throw new Error('expected a sized point');
		const slabs = point.stack.filter((l) => l.kind !== 'probe');
		expect(slabs.map((l) => l.id)).toEqual(['copper-bottom', 'substrate', 'copper-top']);
		expect(slabs[0].zMm).toBe(0);
		for (let i = 1; i < slabs.length; i++) expect(slabs[i].zMm).toBeCloseTo(slabs[i - 1].zMm + slabs[i - 1].thicknessMm, 12);
		// the probe entry is not a slab: it stays last and spans the whole stack from z = 0
		expect(point.stack.at(-1)).toMatchObject({ kind: 'probe', zMm: 0 });
	});

	it('varies the last axis fastest on a grid and pairs values when zipped', () => {
		const grid = sweepCombinations(parseSweepPlan(plan));
		expect(grid.map((c) => c['substrate.heightMm'])).toEqual([0.8, 0.8, 1.2, 1.2, 1.6, 1.6]);
		const zip = sweepCombinations(parseSweepPlan({ combine: 'zip', axes: [{ field: 'frequencyHz', values: [1e9, 2e9] }, { field: 'substrate.heightMm', values: [1, 2] }] }));
		expect(zip).toEqual([{ frequencyHz: 1e9, 'substrate.heightMm': 1 }, { frequencyHz: 2e9, 'substrate.heightMm': 2 }]);
	});

	it('records a point that sizing refuses instead of failing the sweep', () => {
		const doc = buildSweepDocument(base, { axes: [{ field: 'substrate.heightMm', values: [1.524, 90] }] }, meta);
		expect(doc.points[0].status).toBe('sized');
		expect(doc.points[1].status).toBe('refused');
		expect(validate(JSON.parse(serializeSweep(doc)))).toBe(true);
	});

	it.each([
		// 101 × 100 = 10 100 points: over the limit
		{ name: 'a grid over the limit', plan: { axes: [{ field: 'frequencyHz', from: 1e9, to: 2e9, step: 1e7 }, { field: 'substrate.heightMm', from: 0.01, to: 1, step: 0.01 }] }, path: 'plan.axes' },
		// a step so small the axis alone has 10¹² values: refused before any value is made
		{ name: 'a vast single axis', plan: { axes: [{ field: 'frequencyHz', from: 1e9, to: 2e9, step: 1e-3 }] }, path: 'plan.axes' },
		// unknown field
		{ name: 'an unknown field', plan: { axes: [{ field: 'colour', values: [1] }] }, path: 'plan.axes.0' },
		// zipped axes of different lengths
		{ name: 'uneven zipped axes', plan: { combine: 'zip', axes: [{ field: 'frequencyHz', values: [1e9] }, { field: 'substrate.heightMm', values: [1, 2] }] }, path: 'plan.axes.1' }
	])('refuses $name with an InputError before sizing anything', ({ plan: bad, path }) => {
		let error: unknown;
		try {
			buildSweepDocument(base, bad, meta);
		} catch (e) {
			error = e;
		}
		expect(error).toBeInstanceOf(InputError);
		expect((error as InputError).first.path.startsWith(path)).toBe(true);
	});

	it('accepts exactly the limit', () => {
		const p = parseSweepPlan({ axes: [{ field: 'frequencyHz', from: 1, to: MAX_SWEEP_POINTS, step: 1 }] });
		expect(countSweepPoints(p)).toBe(MAX_SWEEP_POINTS);
	});
});
