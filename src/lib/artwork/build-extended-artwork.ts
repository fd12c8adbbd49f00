// Artwork for layered designs (three coppers) and arrays: elements placed on a grid, the corporate feed, the ground, the stack.
import { GeometryError, createRectangleContour, emptyBounds, mergeBounds, type Bounds, type Point } from '../geometry';
import { feedLineOf } from '../rf/feed-kinds';
import type { SizedDesign } from '../rf/sized-design';
import { buildElement, layerRolesOf, shapeBounds, type BuiltElement } from './build-element';
import { buildLayeredStack, copperLayerIds } from './build-stack';
import { layoutCorporateFeed, pieceBounds, pieceShape } from './build-corporate-feed';
import { profileLayer } from './profile-layer';
import { translateShape } from './translate-shape';
import type { Artwork, ArtworkDimension, ArtworkLayer, ArtworkShape } from './types';


const COPPER_TITLES: Record<string, string> = {
	'copper-top': 'Top copper',
	'copper-inner-1': 'Inner copper (layer 2)',
	'copper-bottom': 'Bottom copper'
};

function overlaps(a: Bounds, b: Bounds, gapMm: number): boolean {
	return a.minXMm < b.maxXMm + gapMm && b.minXMm < a.maxXMm + gapMm && a.minYMm < b.maxYMm + gapMm && b.minYMm < a.maxYMm + gapMm;
}
const shift = (b: Bounds, dx: number, dy: number): Bounds => ({ minXMm: b.minXMm + dx, minYMm: b.minYMm + dy, maxXMm: b.maxXMm + dx, maxYMm: b.maxYMm + dy });

/** Builds the artwork of a design that `needsExtendedArtwork` accepts. */
export function buildExtendedArtwork(sized: SizedDesign): Artwork {
	const roles = layerRolesOf(sized);
	const ids = copperLayerIds(roles.copperCount);
	const marginMm = sized.ground.marginMm;
	const array = sized.array;
	const columns = array?.columns ?? 1;
	const rows = array?.rows ?? 1;
	const run = array ? array.network.clearanceMm : marginMm;
	const element: BuiltElement = buildElement(sized, run);
	const dx = array?.spacingXMm ?? 0;
	const dy = array?.spacingYMm ?? 0;
	const origin = (r: number, c: number): Point => [c * dx, r * dy];
	if (array) {
		// neighbouring elements must keep the network clearance between their copper on every layer
		const fp = element.footprint;
		const gap = array.network.clearanceMm;
		if (columns > 1 && !(dx - (fp.maxXMm - fp.minXMm) >= gap)) {
			throw new GeometryError('elements-overlap', `array.spacingXWavelengths gives a pitch of ${dx.toFixed(3)} mm; the element is ${(fp.maxXMm - fp.minXMm).toFixed(3)} mm wide and needs ${gap.toFixed(3)} mm clearance`);
		}
		if (rows > 1 && !(dy - (fp.maxYMm - fp.minYMm) >= gap)) {
			throw new GeometryError('elements-overlap', `array.spacingYWavelengths gives a pitch of ${dy.toFixed(3)} mm; the element is ${(fp.maxYMm - fp.minYMm).toFixed(3)} mm long and needs ${gap.toFixed(3)} mm clearance`);
		}
	}

	// network, in the frame where element (0, 0) has its feed point at the origin
	const pieces = array
		? layoutCorporateFeed(
				Array.from({ length: rows }, (_, r) => Array.from({ length: columns }, (_, c) => origin(r, c))),
				array,
				element.feedFootprint.minXMm,
				element.feedFootprint.minYMm,
				marginMm
			).pieces
		: [];
	if (array) checkNetworkClearance(pieces.map((p) => ({ bounds: pieceBounds(p), element: p.element })), element.feedFootprint, dx, dy, rows, columns, array.network.clearanceMm / 2);

	// board: every non-ground copper plus the margin; the bottom edge is the port (or the single feed line's start)
	let copper: Bounds = emptyBounds;
	for (let r = 0; r < rows; r++)
		for (let c = 0; c < columns; c++) {
			const [ox, oy] = origin(r, c);
			copper = mergeBounds(copper, shift(element.footprint, ox, oy));
		}
	for (const p of pieces) copper = mergeBounds(copper, pieceBounds(p));
	const bottomY = array ? copper.minYMm : 0;
	const offX = marginMm - copper.minXMm;
	const offY = -bottomY;
	const boardW = copper.maxXMm - copper.minXMm + 2 * marginMm;
	const boardL = copper.maxYMm - bottomY + marginMm;

	const shapes: ArtworkShape[][] = ids.map(() => []);
	const voids: ArtworkShape[][] = ids.map(() => []);
	const board = { outer: createRectangleContour(0, 0, boardW, boardL), holes: [] };
	shapes[roles.groundIndex].push({ id: 'ground', role: 'ground', polarity: 'dark', geometry: { kind: 'region', region: board } });
	const name = (r: number, c: number, id: string) => (array ? `e${r}-${c}-${id}` : id);
	for (let r = 0; r < rows; r++) {
		for (let c = 0; c < columns; c++) {
			const [ox, oy] = origin(r, c);
			element.shapes.forEach((list, i) => {
				for (const s of list) shapes[i].push(translateShape(s, ox + offX, oy + offY, name(r, c, s.id)));
			});
			element.voids.forEach((list, i) => {
				for (const s of list) voids[i].push(translateShape(s, ox + offX, oy + offY, name(r, c, s.id)));
			});
			for (const s of element.groundCuts) shapes[roles.groundIndex].push(translateShape(s, ox + offX, oy + offY, name(r, c, s.id)));
		}
	}
	pieces.forEach((p, i) => shapes[roles.feedIndex].push(pieceShape(p, `net-${i}`, offX, offY)));

	const layers: ArtworkLayer[] = ids.map((id, i) => ({
		id,
		title: `${COPPER_TITLES[id] ?? id} (${i === roles.groundIndex ? 'ground' : i === roles.feedIndex && i === roles.topIndex ? 'patch and feed' : i === roles.feedIndex ? (sized.parasitic ? 'driven patch and feed' : 'feed') : sized.parasitic ? 'parasitic patch' : 'patch'})`,
		function: { kind: 'copper', copperIndex: i + 1, side: i === 0 ? 'top' : i === ids.length - 1 ? 'bottom' : 'inner' },
		shapes: shapes[i],
		voids: voids[i]
	}));
	layers.push(profileLayer(board.outer));
	if (sized.input.solderMask) {
		const openings = (i: number, side: 'top' | 'bottom') =>
			shapes[i].filter((s) => s.polarity === 'dark' && s.role !== 'ground').map((s): ArtworkShape => ({ ...s, id: `mask-${side}-${s.id}`, role: 'mask-opening', polarity: 'dark' }));
		layers.push({ id: 'mask-top', title: 'Top solder mask (openings)', function: { kind: 'solder-mask', side: 'top' }, shapes: openings(0, 'top'), voids: [] });
		layers.push({ id: 'mask-bottom', title: 'Bottom solder mask (openings)', function: { kind: 'solder-mask', side: 'bottom' }, shapes: openings(ids.length - 1, 'bottom'), voids: [] });
	}

	const c0: Point = [element.center[0] + offX, element.center[1] + offY];
	return {
		board: { widthMm: boardW, lengthMm: boardL },
		layers,
		drills: [],
		stack: buildLayeredStack(sized),
		dimensions: dimensionsOf(sized, element, c0, offX, offY, boardW, boardL, roles.feedIndex),
		metadata: { designName: sized.input.name, shape: sized.shape, feedKind: sized.feedKind, frequencyHz: sized.frequencyHz, copperLayerCount: roles.copperCount }
	};
}

/** Every network piece keeps `gapMm` from every element's feed-layer copper but the one it starts at. */
function checkNetworkClearance(pieces: { bounds: Bounds; element?: readonly [number, number] }[], footprint: Bounds, dx: number, dy: number, rows: number, columns: number, gapMm: number): void {
	const cell = (v: number, pitch: number, n: number) => (pitch > 0 ? Math.min(n - 1, Math.max(0, Math.floor(v / pitch))) : 0);
	for (const p of pieces) {
		const c0 = cell(p.bounds.minXMm - footprint.maxXMm, dx, columns), c1 = cell(p.bounds.maxXMm - footprint.minXMm, dx, columns) + 1;
		const r0 = cell(p.bounds.minYMm - footprint.maxYMm, dy, rows), r1 = cell(p.bounds.maxYMm - footprint.minYMm, dy, rows) + 1;
		for (let r = Math.max(0, r0 - 1); r <= Math.min(rows - 1, r1); r++) {
			for (let c = Math.max(0, c0 - 1); c <= Math.min(columns - 1, c1); c++) {
				if (p.element && p.element[0] === r && p.element[1] === c) continue;
				if (overlaps(p.bounds, shift(footprint, c * dx, r * dy), gapMm)) {
					throw new GeometryError('feed-network-crowded', `the corporate feed passes within ${gapMm.toFixed(3)} mm of element (row ${r}, column ${c}): raise array.spacingXWavelengths / spacingYWavelengths or use a thinner feed substrate`);
				}
			}
		}
	}
}

function dimensionsOf(sized: SizedDesign, element: BuiltElement, center: Point, offX: number, offY: number, gw: number, gl: number, feedIndex: number): ArtworkDimension[] {
	const [cx, cy] = center;
	const dims: ArtworkDimension[] = [];
	const p = sized.patch;
	if (p.kind === 'circular') dims.push({ id: 'patch-diameter', label: 'D', from: [cx - p.radiusMm, cy], to: [cx + p.radiusMm, cy], valueMm: 2 * p.radiusMm, side: 'above' });
	else {
		const hx = p.kind === 'truncated-corner' ? p.sideMm / 2 : p.widthMm / 2;
		const hy = p.kind === 'truncated-corner' ? p.sideMm / 2 : p.lengthMm / 2;
		dims.push({ id: 'patch-width', label: 'W', from: [cx - hx, cy + hy], to: [cx + hx, cy + hy], valueMm: 2 * hx, side: 'above' });
		dims.push({ id: 'patch-length', label: 'L', from: [cx + hx, cy - hy], to: [cx + hx, cy + hy], valueMm: 2 * hy, side: 'right' });
	}
	const line = feedLineOf(sized.feed);
	if (line) {
		const half = line.widthMm / 2;
		const fy = shapeBounds(element.shapes[feedIndex]).minYMm + offY;
		dims.push({ id: 'feed-width', label: 'Wf', from: [cx - half, fy], to: [cx + half, fy], valueMm: line.widthMm, side: 'below' });
	}
	void offX;
	dims.push({ id: 'ground-width', label: 'Wg', from: [0, 0], to: [gw, 0], valueMm: gw, side: 'below' });
	dims.push({ id: 'ground-length', label: 'Lg', from: [0, 0], to: [0, gl], valueMm: gl, side: 'left' });
	return dims;
}
