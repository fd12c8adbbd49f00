// The Field check's model of a design with a connector launch: plated holes as conducting posts, pads as top copper,
// the XML read back by an independent XML parser (sax) for the posts' places and radii.
import sax from 'sax';
import { describe, expect, it } from 'vitest';
import { buildArtwork } from '../../../src/lib/artwork';
import { buildFieldModel, serializeFieldModel } from '../../../src/lib/simulation';
import { sizedCase } from '../../fixtures/designs/design-cases';

const UM = 1e-3;

describe('the Field check model with an edge launch', () => {
	const plain = buildFieldModel(buildArtwork(sizedCase('rectangular', 'inset')), 50, { mode: 'quick' });
	const artwork = buildArtwork(sizedCase('rectangular', 'inset', { launch: { kind: 'edge' } }));
	const model = buildFieldModel(artwork, 50, { mode: 'quick' });
	const vias = artwork.drills.filter((d) => d.role === 'launch-via');

	it('models each via as a perfectly conducting cylinder from the ground to the top copper', () => {
		const posts = model.properties.find((p) => p.name === 'launch-holes');
		expect(posts?.kind).toBe('pec');
		expect(posts!.primitives.length).toBe(vias.length);
		const dielectric = artwork.stack.find((l) => l.kind === 'dielectric')!;
		for (const v of vias) {
			const c = posts!.primitives.find((p) => p.kind === 'cylinder' && Math.abs(p.centerMm[0] - v.center[0]) < UM && Math.abs(p.centerMm[1] - v.center[1]) < UM);
			expect(c, v.id).toBeDefined();
			if (c?.kind !== 'cylinder') continue;
			expect(c.radiusMm).toBeCloseTo(v.diameterMm / 2, 9);
			expect(c.fromZMm).toBeCloseTo(dielectric.zMm, 9);
			expect(c.toZMm).toBeCloseTo(dielectric.zMm + dielectric.thicknessMm, 9);
		}
	});

	it('passes a mesh line through every via, in x and in y (within its radius: nearby fixed lines, such as the port plane, merge)', () => {
		for (const v of vias) {
			const r = v.diameterMm / 2;
			expect(model.mesh.xMm.some((x) => Math.abs(x - v.center[0]) < r), `${v.id} x`).toBe(true);
			expect(model.mesh.yMm.some((y) => Math.abs(y - v.center[1]) < r), `${v.id} y`).toBe(true);
		}
	});

	it('draws the ground pads as top copper (three outlines: patch with line, two pads) and leaves a design without a launch as it was', () => {
		const top = model.properties.find((p) => p.name === 'copper-top')!;
		expect(top.primitives.length).toBe(3);
		expect(plain.properties.map((p) => p.name)).toEqual(['substrate', 'copper-top', 'copper-ground']);
	});

	it('writes the posts into the engine XML as cylinders an XML parser reads back', () => {
		const xml = serializeFieldModel(model);
		const cylinders: Record<string, string>[] = [];
		const parser = sax.parser(true) as unknown as { onopentag: (t: { name: string; attributes: Record<string, string> }) => void; write(s: string): { close(): unknown } };
		parser.onopentag = (t) => {
			if (t.name === 'Cylinder') cylinders.push(t.attributes);
		};
		parser.write(xml).close();
		// the probe-less inset design has no other cylinder: one per via
		expect(cylinders.length).toBe(vias.length);
		expect(cylinders.every((c) => Math.abs(Number(c.Radius) - 0.15) < UM)).toBe(true);
	});
});
