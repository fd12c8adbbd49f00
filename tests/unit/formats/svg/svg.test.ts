// SVG drawings checked as well-formed XML with sax in strict mode (svgdom's own XML parser, the outside reference),
// then loaded into an svgdom document for queries: mm units, one group per layer, extents.
import sax from 'sax';
import { createSVGWindow } from 'svgdom';
import { describe, expect, it } from 'vitest';
import { buildArtwork } from '../../../../src/lib/artwork';
import { createExportMeta } from '../../../../src/lib/formats/export-meta';
import { buildSvgTree, toSvg, type SvgElement } from '../../../../src/lib/formats/svg';
import { allShapeFeedCases, sizedCase } from '../../../fixtures/designs/design-cases';
import { layeredCases } from '../../../fixtures/designs/layered-cases';
import { sizeDocument } from '../../../fixtures/designs/size-document';

const meta = createExportMeta({ designName: 'Sunroof GNSS', revisionLabel: 'B', revisionDate: '2026-11-20' });
const cases = allShapeFeedCases.map((c) => ({ ...c, artwork: buildArtwork(sizedCase(c.shape, c.feed, { solderMask: true })) }));

function parseXml(text: string): Document {
	const strict = sax.parser(true);
	const errors: Error[] = [];
	strict.onerror = (e: Error) => {
		errors.push(e);
		strict.resume();
	};
	strict.write(text).close();
	expect(errors).toEqual([]);
	const window = createSVGWindow();
	window.document.documentElement.outerHTML = text.replace(/^<\?xml[^>]*>\s*/, '').trim();
	return window.document;
}

/** Points of path data (M/L/A end points), circles as boxes. Path syntax per SVG 1.1 §8.3. */
function groupExtents(g: Element): { minX: number; minY: number; maxX: number; maxY: number } {
	let minX = Infinity, minY = Infinity, maxX = -Infinity, maxY = -Infinity;
	const add = (x: number, y: number) => {
		minX = Math.min(minX, x); minY = Math.min(minY, y); maxX = Math.max(maxX, x); maxY = Math.max(maxY, y);
	};
	for (const node of Array.from(g.querySelectorAll('path'))) {
		const d = node.getAttribute('d') ?? '';
		for (const m of d.matchAll(/([MLA])([^MLAZ]*)/g)) {
			const n = m[2].trim().split(/[\s,]+/).map(Number);
			add(n[n.length - 2], n[n.length - 1]);
		}
	}
	for (const c of Array.from(g.querySelectorAll('circle'))) {
		const [cx, cy, r] = ['cx', 'cy', 'r'].map((k) => Number(c.getAttribute(k)));
		add(cx - r, cy - r);
		add(cx + r, cy + r);
	}
	return { minX, minY, maxX, maxY };
}

describe('SVG writer', () => {
	it.each(cases)('parses as XML with mm units, one group per layer and board extents for a $shape / $feed design', ({ artwork }) => {
		const doc = parseXml(toSvg(artwork, meta));
		const svg = doc.documentElement;
		expect(svg.nodeName.toLowerCase()).toBe('svg');
		expect(svg.getAttribute('width')).toMatch(/^[\d.]+mm$/);
		expect(svg.getAttribute('height')).toMatch(/^[\d.]+mm$/);
		const vb = svg.getAttribute('viewBox')!.split(' ').map(Number);
		// 1 user unit = 1 mm: viewBox size equals width/height in mm (SVG 1.1 §7.7)
		expect(vb[2]).toBeCloseTo(parseFloat(svg.getAttribute('width')!), 6);
		expect(vb[3]).toBeCloseTo(parseFloat(svg.getAttribute('height')!), 6);
		for (const layer of artwork.layers) expect(doc.querySelectorAll(`g#layer-${layer.id}`).length).toBe(1);
		const layerGroups = Array.from(doc.querySelectorAll('g')).filter((g) => (g.getAttribute('id') ?? '').startsWith('layer-'));
		expect(layerGroups.length).toBe(artwork.layers.length);
		const ext = groupExtents(doc.querySelector('g#layer-profile')!);
		expect(ext.minX).toBeCloseTo(0, 3);
		expect(ext.minY).toBeCloseTo(0, 3);
		expect(ext.maxX).toBeCloseTo(artwork.board.widthMm, 3);
		expect(ext.maxY).toBeCloseTo(artwork.board.lengthMm, 3);
		for (const g of layerGroups) {
			const e = groupExtents(g);
			if (!Number.isFinite(e.minX)) continue;
			expect(e.minX).toBeGreaterThanOrEqual(-1e-4);
			expect(e.minY).toBeGreaterThanOrEqual(-1e-4);
			expect(e.maxX).toBeLessThanOrEqual(artwork.board.widthMm + 1e-4);
			expect(e.maxY).toBeLessThanOrEqual(artwork.board.lengthMm + 1e-4);
		}
		// the viewBox holds the board and the annotations
		expect(vb[0]).toBeLessThan(0);
		expect(vb[0] + vb[2]).toBeGreaterThan(artwork.board.widthMm);
	});

	it('dimensions W, L, inset depth, feed width and ground size of an inset-fed patch, and titles the drawing', () => {
		const a = buildArtwork(sizedCase('rectangular', 'inset'));
		const text = toSvg(a, meta);
		const doc = parseXml(text);
		for (const id of ['patch-width', 'patch-length', 'inset-depth', 'notch-gap', 'feed-width', 'ground-width', 'ground-length']) {
			expect(doc.querySelectorAll(`g#dimension-${id}`).length).toBe(1);
		}
		// each label prints its value to 0.01 mm (no fab profile: the default resolution)
		for (const d of a.dimensions) {
			expect(doc.querySelector(`g#dimension-${d.id} text`)!.textContent).toBe(`${d.label} ${d.valueMm.toFixed(2)}`);
		}
		const block = doc.querySelector('g#title-block')!.textContent!;
		expect(block).toContain('Sunroof GNSS');
		expect(block).toContain('Revision B');
		expect(block).toContain('2026-11-20');
		expect(block).toContain('εr 3.55');
		expect(block).toContain('scale 1:1');
		expect(block).toContain('First-pass estimate — verify by simulation and measurement');
	});

	it('dimensions the probe centre from datum A, the board corner: x and y equal the drill centre', () => {
		const a = buildArtwork(sizedCase('rectangular', 'probe'));
		const doc = parseXml(toSvg(a, meta));
		const [x, y] = a.drills[0].center;
		expect(doc.querySelector('g#dimension-probe-x text')!.textContent).toBe(`xp ${x.toFixed(2)}`);
		expect(doc.querySelector('g#dimension-probe-y text')!.textContent).toBe(`yp ${y.toFixed(2)}`);
		expect(doc.querySelector('g#datum-a text')!.textContent).toBe('A');
	});

	it('prints sizes to the resolution it is given', () => {
		const a = buildArtwork(sizedCase('circular', 'edge'));
		const doc = parseXml(toSvg(a, meta, { resolutionMm: 0.001 }));
		expect(doc.querySelector('g#dimension-patch-diameter text')!.textContent).toMatch(/^D \d+\.\d{3}$/);
	});

	it('draws mask openings as dashed outlines over full-colour copper, never a tint', () => {
		const a = buildArtwork(sizedCase('rectangular', 'inset', { solderMask: true }));
		const doc = parseXml(toSvg(a, meta));
		const mask = doc.querySelector('g#layer-mask-top')!;
		expect(mask.getAttribute('opacity')).toBe('1');
		for (const s of Array.from(mask.querySelectorAll('path, circle'))) {
			expect(s.getAttribute('fill')).toBe('none');
			expect(s.getAttribute('stroke-dasharray')).not.toBeNull();
		}
		const copper = doc.querySelector('g#layer-copper-top')!;
		expect(copper.getAttribute('opacity')).toBe('1');
		expect(copper.querySelector('path#patch')!.getAttribute('fill')).toBe('#d98f55');
		// the ground is hatched, and drawn before (under) the top copper
		const groups = Array.from(doc.querySelectorAll('g')).map((g) => g.getAttribute('id'));
		expect(groups.indexOf('layer-copper-bottom')).toBeLessThan(groups.indexOf('layer-copper-top'));
		expect(doc.querySelector('g#layer-copper-bottom path#ground')!.getAttribute('fill')).toBe('url(#ground-hatch)');
	});

	it('keeps a top copper over buried ones opaque and draws what lies under it as dashed hidden edges', () => {
		const a = buildArtwork(sizeDocument(layeredCases.find((c) => c.name === 'aperture-coupled patch')!.doc));
		const doc = parseXml(toSvg(a, meta));
		expect(doc.querySelector('g#layer-copper-top')!.getAttribute('opacity')).toBe('1');
		const hidden = doc.querySelector('g#hidden-edges')!;
		// the feed line on the bottom copper and the slot cut out of the inner ground
		for (const id of ['hidden-feed-line', 'hidden-coupling-slot']) {
			const edge = hidden.querySelector(`#${id}`)!;
			expect(edge.getAttribute('fill')).toBe('none');
			expect(edge.getAttribute('stroke-dasharray')).not.toBeNull();
		}
		// the ground itself is no hidden edge, and the hidden edges come after every layer
		expect(hidden.querySelector('#hidden-ground')).toBeNull();
		const groups = Array.from(doc.querySelectorAll('g')).map((g) => g.getAttribute('id'));
		for (const layer of a.layers) expect(groups.indexOf(`layer-${layer.id}`)).toBeLessThan(groups.indexOf('hidden-edges'));
	});

	it('draws a layer of a kind it does not know as an outline group of its own', () => {
		const a = buildArtwork(sizedCase('rectangular', 'edge'));
		const extra = { id: 'legend-top', title: 'Legend', function: { kind: 'legend', side: 'top' }, voids: [], shapes: [{ id: 'mark', role: 'profile', polarity: 'dark', geometry: { kind: 'circle', center: [2, 2], diameterMm: 1 } }] };
		const doc = parseXml(toSvg({ ...a, layers: [...a.layers, extra] } as unknown as typeof a, meta));
		const circle = doc.querySelector('g#layer-legend-top circle#mark')!;
		expect(circle.getAttribute('fill')).toBe('none');
		expect(circle.getAttribute('stroke')).not.toBeNull();
	});

	it('flips y once: the feed, at y = 0 on the board, sits at the bottom of the drawing', () => {
		const a = buildArtwork(sizedCase('rectangular', 'edge'));
		const tree = buildSvgTree(a, meta);
		const top = tree.children.find((c) => c.attributes.id === 'layer-copper-top') as SvgElement;
		const feed = top.children.find((c) => c.attributes.id === 'feed-line')!;
		const ys = [...feed.attributes.d.matchAll(/[ML][\d.]+ ([\d.]+)/g)].map((m) => Number(m[1]));
		expect(Math.max(...ys)).toBeCloseTo(a.board.lengthMm, 4);
	});

	it('cuts the probe clearance out of the ground with a mask', () => {
		const a = buildArtwork(sizedCase('rectangular', 'probe'));
		const doc = parseXml(toSvg(a, meta));
		expect(doc.querySelector('g#layer-copper-bottom')!.getAttribute('mask')).toBe('url(#clear-copper-bottom)');
		expect(doc.querySelectorAll('mask#clear-copper-bottom circle').length).toBe(1);
	});

	it('writes the same text from two fresh windows', () => {
		const a = cases[0].artwork;
		expect(toSvg(a, meta)).toBe(toSvg(a, meta));
	});
});
