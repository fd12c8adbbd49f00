// Gerber files read back with @tracespace/parser 5.0.0-next.0 (the outside reference): structure, coordinates, copper area.
import polygonClipping, { type MultiPolygon } from 'polygon-clipping';
import { describe, expect, it } from 'vitest';
import { buildArtwork, type Artwork, type ArtworkLayer } from '../../../../src/lib/artwork';
import { contourArea, flattenContour, regionArea } from '../../../../src/lib/geometry';
import { createExportMeta } from '../../../../src/lib/formats/export-meta';
import { buildGerberCommands, toGerber } from '../../../../src/lib/formats/gerber';
import { allShapeFeedCases, sizedCase } from '../../../fixtures/designs/design-cases';
import { circleRing, readBackGerber, ringOfReadContour, type ReadBack } from './read-back';

const meta = createExportMeta({ designName: 'Sunroof GNSS', revisionLabel: 'B', revisionDate: '2026-11-20' });
const MICRON_MM = 1e-3;

function ringArea(ring: [number, number][]): number {
	let s = 0;
	for (let i = 0; i + 1 < ring.length; i++) s += ring[i][0] * ring[i + 1][1] - ring[i + 1][0] * ring[i][1];
	return s / 2;
}
function multiArea(mp: MultiPolygon): number {
	return mp.reduce((sum, poly) => sum + poly.reduce((a, ring) => a + ringArea(ring as [number, number][]), 0), 0);
}

/** Copper area of the artwork layer via polygon-clipping (outside reference) over flattened exact shapes. */
function artworkLayerArea(layer: ArtworkLayer): number {
	let image: MultiPolygon = [];
	for (const s of layer.shapes) {
		const g = s.geometry;
		if (g.kind === 'outline' || g.kind === 'stroke') continue;
		const rings =
			g.kind === 'circle'
				? [circleRing([g.center[0], g.center[1]], g.diameterMm)]
				: [g.region.outer, ...g.region.holes].map((c) => {
						const pts = flattenContour(c).map(([x, y]) => [x, y] as [number, number]);
						return [...pts, pts[0]];
					});
		image = s.polarity === 'dark' ? polygonClipping.union(image, [rings]) : polygonClipping.difference(image, [rings]);
	}
	return multiArea(image);
}

/** Copper area rebuilt from what the parser read: regions and flashes replayed in file order. */
function readBackArea(read: ReadBack): number {
	type Item = { polarity: 'dark' | 'clear'; ring: [number, number][] };
	// regions and flashes interleave in the file; replay by their order in the tree
	const items: Item[] = [];
	let r = 0, f = 0;
	for (const node of read.tree.children) {
		if (node.type === 'regionMode' && !node.region) {
			const reg = read.regions[r++];
			items.push({ polarity: reg.polarity, ring: ringOfReadContour(reg.contour) });
		} else if (node.type === 'graphic' && node.graphic === 'shape') {
			const fl = read.flashes[f++];
			items.push({ polarity: fl.polarity, ring: circleRing(fl.at, fl.diameterMm) });
		}
	}
	let image: MultiPolygon = [];
	for (const it of items) image = it.polarity === 'dark' ? polygonClipping.union(image, [[it.ring]]) : polygonClipping.difference(image, [[it.ring]]);
	return multiArea(image);
}

const cases = allShapeFeedCases.map((c) => ({ ...c, artwork: buildArtwork(sizedCase(c.shape, c.feed, { solderMask: true })) }));
const gerberLayers = (a: Artwork) => a.layers.filter((l) => l.function.kind !== 'profile');

describe('Gerber writer', () => {
	it.each(cases)('parses every layer of a $shape patch with $feed feed without errors', ({ artwork }) => {
		for (const layer of artwork.layers) {
			const read = readBackGerber(toGerber(artwork, layer.id, meta));
			// @tracespace/parser: a complete parse has filetype gerber and reaches M02
			expect(read.tree.filetype).toBe('gerber');
			expect(read.tree.done).toBe(true);
			const unknown = read.tree.children.filter((n) => n.type === 'unimplemented' && !/^%T[FAD]/.test(n.value));
			expect(unknown).toEqual([]);
		}
	});

	it.each(cases)('reads back every vertex and arc centre of a $shape / $feed design within 1 µm', ({ artwork }) => {
		for (const layer of gerberLayers(artwork)) {
			const read = readBackGerber(toGerber(artwork, layer.id, meta));
			const contours = layer.shapes.flatMap((s) => (s.geometry.kind === 'region' ? [s.geometry.region.outer, ...s.geometry.region.holes] : []));
			expect(read.regions.length).toBe(contours.length);
			contours.forEach((c, i) => {
				const got = read.regions[i].contour;
				expect(got.length).toBe(c.segments.length);
				expect(Math.abs(got[0].from[0] - c.start[0])).toBeLessThan(MICRON_MM);
				expect(Math.abs(got[0].from[1] - c.start[1])).toBeLessThan(MICRON_MM);
				c.segments.forEach((seg, k) => {
					expect(Math.abs(got[k].to[0] - seg.to[0])).toBeLessThan(MICRON_MM);
					expect(Math.abs(got[k].to[1] - seg.to[1])).toBeLessThan(MICRON_MM);
					if (seg.kind === 'arc') {
						expect(got[k].kind).toBe(seg.clockwise ? 'cw' : 'ccw');
						expect(Math.abs(got[k].center![0] - seg.center[0])).toBeLessThan(MICRON_MM);
						expect(Math.abs(got[k].center![1] - seg.center[1])).toBeLessThan(MICRON_MM);
					} else expect(got[k].kind).toBe('line');
				});
			});
			const circles = layer.shapes.flatMap((s) => (s.geometry.kind === 'circle' ? [s.geometry] : []));
			expect(read.flashes.length).toBe(circles.length);
			circles.forEach((c, i) => {
				expect(Math.abs(read.flashes[i].at[0] - c.center[0])).toBeLessThan(MICRON_MM);
				expect(Math.abs(read.flashes[i].at[1] - c.center[1])).toBeLessThan(MICRON_MM);
				expect(Math.abs(read.flashes[i].diameterMm - c.diameterMm)).toBeLessThan(MICRON_MM);
			});
		}
	});

	it.each(cases)('rebuilds the copper area of a $shape / $feed design from the parsed file within 0.1 %', ({ artwork }) => {
		for (const layer of artwork.layers.filter((l) => l.function.kind === 'copper')) {
			const expected = artworkLayerArea(layer);
			const got = readBackArea(readBackGerber(toGerber(artwork, layer.id, meta)));
			expect(expected).toBeGreaterThan(0);
			expect(Math.abs(got - expected) / expected).toBeLessThan(1e-3);
		}
	});

	it('matches the exact arc area of a circular patch with the parsed, flattened one within 0.1 %', () => {
		const sized = sizedCase('circular', 'probe');
		if (sized.patch.kind !== 'circular') throw new Error('expected a circular patch');
		const a = buildArtwork(sized);
		const patch = a.layers[0].shapes.find((s) => s.id === 'patch')!;
		if (patch.geometry.kind !== 'region') throw new Error('patch must be a region');
		const exact = regionArea(patch.geometry.region);
		// πr², the closed form (any geometry text)
		expect(Math.abs(exact - Math.PI * sized.patch.radiusMm ** 2)).toBeLessThan(1e-9);
		expect(contourArea(patch.geometry.region.outer)).toBeGreaterThan(0);
		const read = readBackGerber(toGerber(a, 'copper-top', meta));
		const parsed = ringArea(ringOfReadContour(read.regions[0].contour));
		expect(Math.abs(parsed - exact) / exact).toBeLessThan(1e-3);
	});

	it('writes the X2 file attributes of each layer per the Gerber Layer Format Specification §5.6', () => {
		const a = cases.find((c) => c.shape === 'rectangular' && c.feed === 'probe')!.artwork;
		const attrs = (id: string) => readBackGerber(toGerber(a, id, meta)).fileAttributes;
		expect(attrs('copper-top')).toContain('%TF.FileFunction,Copper,L1,Top*%');
		expect(attrs('copper-bottom')).toContain('%TF.FileFunction,Copper,L2,Bot*%');
		expect(attrs('profile')).toContain('%TF.FileFunction,Profile,NP*%');
		expect(attrs('mask-top')).toContain('%TF.FileFunction,Soldermask,Top*%');
		expect(attrs('mask-top')).toContain('%TF.FilePolarity,Negative*%');
		expect(attrs('copper-top')).toContain('%TF.FilePolarity,Positive*%');
		expect(attrs('copper-top')).toContain('%TF.GenerationSoftware,Fringefield,Fringefield,0.1.0*%');
		expect(attrs('copper-top')).toContain('%TF.SameCoordinates,sunroof-gnss-B*%');
	});

	it('draws the probe clearance as a clear-polarity flash on the ground layer', () => {
		const a = cases.find((c) => c.shape === 'rectangular' && c.feed === 'probe')!.artwork;
		const cmds = buildGerberCommands(a, 'copper-bottom', meta);
		const lpc = cmds.findIndex((c) => c.type === 'polarity' && c.polarity === 'clear');
		const flash = cmds.findIndex((c) => c.type === 'flash');
		expect(lpc).toBeGreaterThan(-1);
		expect(flash).toBeGreaterThan(lpc);
		const text = toGerber(a, 'copper-bottom', meta);
		expect(text.trimEnd().endsWith('M02*')).toBe(true);
		expect(text).toContain('%FSLAX46Y46*%');
		expect(text).toContain('%MOMM*%');
	});

	it('declares G75 before the first arc', () => {
		const a = cases.find((c) => c.shape === 'circular' && c.feed === 'edge')!.artwork;
		const text = toGerber(a, 'copper-top', meta);
		expect(text.indexOf('G75*')).toBeGreaterThan(-1);
		expect(text.indexOf('G75*')).toBeLessThan(text.search(/G0[23]\*/));
	});

	it('strokes the board profile along the board rectangle', () => {
		const a = cases[0].artwork;
		const read = readBackGerber(toGerber(a, 'profile', meta));
		const xs = read.strokes.flatMap((s) => [s.from[0], s.to[0]]);
		const ys = read.strokes.flatMap((s) => [s.from[1], s.to[1]]);
		expect(Math.min(...xs)).toBeCloseTo(0, 6);
		expect(Math.max(...xs)).toBeCloseTo(a.board.widthMm, 5);
		expect(Math.max(...ys)).toBeCloseTo(a.board.lengthMm, 5);
		expect(read.strokes.length).toBe(4);
	});
});
