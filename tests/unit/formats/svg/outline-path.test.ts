// The outline path for pasting: one SVG path `d` of the board profile and the copper outlines in mm, read back with
// svgdom's path parser (the outside reference: SVGPathElement path data per SVG 1.1 §8.3).
import { createSVGWindow } from 'svgdom';
import { describe, expect, it } from 'vitest';
import { buildArtwork } from '../../../../src/lib/artwork';
import { outlinePathData } from '../../../../src/lib/formats/svg';
import { sizedCase } from '../../../fixtures/designs/design-cases';

/** Subpaths of path data: each starts with M; the first point of each. */
function subpathStarts(d: string): [number, number][] {
	return [...d.matchAll(/M([-\d.]+) ([-\d.]+)/g)].map((m) => [Number(m[1]), Number(m[2])]);
}

describe('outlinePathData', () => {
	it('starts with the board profile and spans exactly the board, in mm', () => {
		const a = buildArtwork(sizedCase('rectangular', 'inset'));
		const d = outlinePathData(a);
		const window = createSVGWindow();
		const path = window.document.createElementNS('http://www.w3.org/2000/svg', 'path');
		path.setAttribute('d', d);
		window.document.documentElement.appendChild(path);
		// svgdom computes the box of the path data it parsed
		const box = (path as unknown as { getBBox(): { x: number; y: number; width: number; height: number } }).getBBox();
		expect(box.x).toBeCloseTo(0, 4);
		expect(box.y).toBeCloseTo(0, 4);
		expect(box.width).toBeCloseTo(a.board.widthMm, 4);
		expect(box.height).toBeCloseTo(a.board.lengthMm, 4);
		const [x0, y0] = subpathStarts(d)[0];
		expect(x0).toBeCloseTo(0, 4);
		expect(y0).toBeCloseTo(a.board.lengthMm, 4);
	});

	it('holds one closed subpath per copper contour but none for the ground plane', () => {
		const a = buildArtwork(sizedCase('rectangular', 'inset'));
		const d = outlinePathData(a);
		const copper = a.layers.filter((l) => l.function.kind === 'copper').flatMap((l) => l.shapes).filter((s) => s.polarity === 'dark' && s.role !== 'ground');
		const contours = copper.reduce((n, s) => n + (s.geometry.kind === 'region' ? 1 + s.geometry.region.holes.length : 1), 0);
		// profile + patch + feed line
		expect(contours).toBe(2);
		expect(subpathStarts(d).length).toBe(1 + contours);
		expect(d.match(/Z/g)!.length).toBe(1 + contours);
	});

	it('writes a round pad as two half-turn arcs about its centre (y flipped)', () => {
		const a = buildArtwork(sizedCase('circular', 'probe'));
		const pad = a.layers.find((l) => l.id === 'copper-top')!.shapes.find((s) => s.role === 'probe-pad')!;
		if (pad.geometry.kind !== 'circle') throw new Error('expected a circle');
		const { center, diameterMm } = pad.geometry;
		const r = diameterMm / 2;
		const d = outlinePathData(a);
		const y = a.board.lengthMm - center[1];
		const arcs = [...d.matchAll(/M([-\d.]+) ([-\d.]+)A([-\d.]+) [-\d.]+ 0 1 0 ([-\d.]+) ([-\d.]+)A/g)].map((m) => m.slice(1).map(Number));
		const found = arcs.find(([x0, y0, rr]) => Math.abs(x0 - (center[0] - r)) < 1e-4 && Math.abs(y0 - y) < 1e-4 && Math.abs(rr - r) < 1e-4);
		expect(found).toBeDefined();
		expect(found![3]).toBeCloseTo(center[0] + r, 4);
	});
});
