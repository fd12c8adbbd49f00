// The one zod schema of the artwork and of a sweep point: every artwork we draw parses (so the inferred types describe
// real values), and the JSON Schema generated from them refuses what they refuse (ajv 8, draft 2020-12, the outside reference).
import Ajv2020 from 'ajv/dist/2020';
import { describe, expect, it } from 'vitest';
import { prepare } from '../../../src/lib/design';
import { buildSweepDocument, createExportMeta, sweepJsonSchema } from '../../../src/lib/formats';
import { parseDesignInput } from '../../../src/lib/schemas';
import { artworkSchema } from '../../../src/lib/schemas/artwork';
import { sweepPointSchema } from '../../../src/lib/schemas/sweep-point';
import { violationSchema } from '../../../src/lib/schemas/violation';
import { allShapeFeedCases, designDocument } from '../../fixtures/designs/design-cases';
import { layeredCases } from '../../fixtures/designs/layered-cases';

const meta = createExportMeta({ designName: 'Schema check', revisionLabel: 'A', revisionDate: '2026-12-02' });
const docs = [...allShapeFeedCases.map((c) => designDocument(c.shape, c.feed, { solderMask: true })), ...layeredCases.map((c) => c.doc)];
const validate = new Ajv2020({ strict: false, allErrors: true }).compile(sweepJsonSchema as object);

describe('the artwork schema', () => {
	it.each(docs.map((doc, i) => [i, doc] as const))('parses the artwork of fixture design %i', (_i, doc) => {
		const { artwork } = prepare(parseDesignInput(doc));
		expect(artworkSchema.safeParse(JSON.parse(JSON.stringify(artwork))).success).toBe(true);
	});

	it('refuses a drill without a positive diameter and a shape of an unknown role', () => {
		const { artwork } = prepare(parseDesignInput(designDocument('rectangular', 'probe')));
		const json = JSON.parse(JSON.stringify(artwork));
		expect(artworkSchema.safeParse({ ...json, drills: [{ ...json.drills[0], diameterMm: 0 }] }).success).toBe(false);
		const layers = [{ ...json.layers[0], shapes: [{ ...json.layers[0].shapes[0], role: 'antenna' }] }, ...json.layers.slice(1)];
		expect(artworkSchema.safeParse({ ...json, layers }).success).toBe(false);
	});
});

describe('the sweep point schema and the published JSON Schema generated from it', () => {
	const doc = JSON.parse(JSON.stringify(buildSweepDocument(designDocument('rectangular', 'probe', { probe: { model: 'plated-barrel' } }), { axes: [{ field: 'frequencyHz', values: [2.4e9, 2.5e9] }] }, meta)));

	it('accept every point we write', () => {
		for (const point of doc.points) expect(sweepPointSchema.safeParse(point).success).toBe(true);
		expect(validate(doc)).toBe(true);
	});

	it('refuse a point whose drill has a negative diameter, in zod and in the JSON Schema alike', () => {
		const bad = { ...doc, points: [{ ...doc.points[0], drills: [{ ...doc.points[0].drills[0], diameterMm: -1 }] }] };
		expect(sweepPointSchema.safeParse(bad.points[0]).success).toBe(false);
		expect(validate(bad)).toBe(false);
	});

	it('refuse a point with a field the schema does not know', () => {
		const bad = { ...doc, points: [{ ...doc.points[0], colour: 'red' }] };
		expect(sweepPointSchema.safeParse(bad.points[0]).success).toBe(false);
		expect(validate(bad)).toBe(false);
	});
});

describe('the violation schema', () => {
	it('names only our rule ids', () => {
		const v = { ruleId: 'trace-width', layerId: 'copper-top', shapeIds: ['feed-line'], location: { xMm: 1, yMm: 2 }, measuredMm: 0.1, requiredMm: 0.15, message: 'too narrow' };
		expect(violationSchema.safeParse(v).success).toBe(true);
		expect(violationSchema.safeParse({ ...v, ruleId: 'trace-colour' }).success).toBe(false);
	});
});
