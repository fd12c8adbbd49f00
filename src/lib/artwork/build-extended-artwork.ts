// Artwork for layered designs (three coppers) and arrays: elements placed on a grid, the corporate feed, the ground, the stack.
import { GeometryError, createRectangleContour, emptyBounds, mergeBounds, type Bounds, type Point } from '../geometry';
import type { SizedDesign } from '../rf/sized-design';
import { buildDimensions } from './build-dimensions';
import { buildElement, layerRolesOf, shapeBounds, type BuiltElement } from './build-element';
import { buildLayeredStack, copperLayerIds } from './build-stack';
import { layoutCorporateFeed, pieceBounds, pieceShape, type NetworkPiece } from './build-corporate-feed';
import { profileLayer } from './profile-layer';
import { translateShape } from './translate-shape';
import type { Artwork, ArtworkLayer, ArtworkShape } from './types';


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
	const pieces = array ? placeArray(sized, element, marginMm) : [];
	const origin = (r: number, c: number): Point => [c * dx, r * dy];

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

	// an array's sizes on its upper right element (nothing between it and the top and right edges), its feed on the lower right one
	const [topX, topY] = origin(rows - 1, columns - 1);
	const [feedX, feedY] = origin(0, columns - 1);
	const at = (ox: number, oy: number): Point => [element.center[0] + ox + offX, element.center[1] + oy + offY];
	return {
		board: { widthMm: boardW, lengthMm: boardL },
		layers,
		drills: [],
		stack: buildLayeredStack(sized),
		dimensions: buildDimensions(sized, {
			center: at(topX, topY),
			patchEdgeYMm: element.patchEdgeYMm + topY + offY,
			feedElement: { center: at(feedX, feedY), patchEdgeYMm: element.patchEdgeYMm + feedY + offY },
			feedStartYMm: shapeBounds(element.shapes[roles.feedIndex]).minYMm + feedY + offY,
			board: { widthMm: boardW, lengthMm: boardL },
			...(array ? { pitch: { xMm: columns > 1 ? dx : null, yMm: rows > 1 ? dy : null } } : {})
		}),
		metadata: { designName: sized.input.name, shape: sized.shape, feedKind: sized.feedKind, frequencyHz: sized.frequencyHz, copperLayerCount: roles.copperCount }
	};
}

/** Why an array does not fit at a pitch: the code, the axis whose pitch is short, and what collides. */
interface ArrayMisfit {
	code: 'elements-overlap' | 'network-arm-too-short' | 'feed-network-crowded';
	axis: 'x' | 'y';
	what: string;
}

const AXIS_KEY = { x: 'spacingXWavelengths', y: 'spacingYWavelengths' } as const;

/** Lays out the network at pitches dx, dy; a misfit when elements or the network collide. */
function tryArray(sized: SizedDesign, element: BuiltElement, marginMm: number, dx: number, dy: number): { pieces: NetworkPiece[] } | ArrayMisfit {
	const array = sized.array!;
	const { columns, rows } = array;
	// neighbouring elements must keep the network clearance between their copper on every layer
	const fp = element.footprint;
	const gap = array.network.clearanceMm;
	if (columns > 1 && !(dx - (fp.maxXMm - fp.minXMm) >= gap)) {
		return { code: 'elements-overlap', axis: 'x', what: `the element is ${(fp.maxXMm - fp.minXMm).toFixed(3)} mm wide and needs ${gap.toFixed(3)} mm clearance to its neighbour` };
	}
	if (rows > 1 && !(dy - (fp.maxYMm - fp.minYMm) >= gap)) {
		return { code: 'elements-overlap', axis: 'y', what: `the element is ${(fp.maxYMm - fp.minYMm).toFixed(3)} mm long and needs ${gap.toFixed(3)} mm clearance to its neighbour` };
	}
	let pieces: NetworkPiece[];
	try {
		const points = Array.from({ length: rows }, (_, r) => Array.from({ length: columns }, (_, c): Point => [c * dx, r * dy]));
		pieces = layoutCorporateFeed(points, array, element.feedFootprint.minXMm, element.feedFootprint.minYMm, marginMm).pieces;
	} catch (e) {
		if (e instanceof GeometryError && e.code === 'network-arm-too-short') return { code: e.code, axis: /spacingY/.test(e.message) ? 'y' : 'x', what: e.message.replace(/: raise .*$/, '') };
		throw e;
	}
	const crowded = networkCollision(pieces, element.feedBoxes, dx, dy, rows, columns, gap / 2);
	if (crowded && crowded.axis === 'y') {
		// several rows: each row's tree runs in the gap below its row, one line per level and the connector
		const lengthMm = fp.maxYMm - fp.minYMm;
		const lines = Math.round(Math.log2(columns)) + 1;
		return {
			...crowded,
			what: `${crowded.what}: the gap between rows, ${(dy - lengthMm).toFixed(3)} mm (the pitch less the element's ${lengthMm.toFixed(3)} mm), must hold each row's feed tree of ${lines} line${lines === 1 ? '' : 's'} ${array.network.levelPitchMm.toFixed(3)} mm apart`
		};
	}
	return crowded ?? { pieces };
}

/** The network pieces of an array, or a GeometryError naming the pitch that is short and the smallest that builds. */
function placeArray(sized: SizedDesign, element: BuiltElement, marginMm: number): NetworkPiece[] {
	const array = sized.array!;
	const lambda0 = sized.freeSpaceWavelengthMm;
	const first = tryArray(sized, element, marginMm, array.spacingXMm, array.spacingYMm);
	if ('pieces' in first) return first.pieces;
	// the smallest pitch on the short axis (the other kept) that builds, in steps of 0.005 λ0 up to the schema's 2 λ0
	const step = 0.005;
	let smallest: { x: number; y: number } | null = null;
	const sx = array.spacingXWavelengths, sy = array.spacingYWavelengths;
	for (let k = 1; k <= Math.ceil((2 - (first.axis === 'x' ? sx : sy)) / step); k++) {
		const s = Math.ceil(((first.axis === 'x' ? sx : sy) + k * step) / step - 1e-9) * step;
		const x = first.axis === 'x' ? s : sx, y = first.axis === 'y' ? s : sy;
		if (x > 2 || y > 2) break;
		const t = tryArray(sized, element, marginMm, x * lambda0, y * lambda0);
		if ('pieces' in t) {
			smallest = { x, y };
			break;
		}
		if (t.axis !== first.axis) break;
	}
	const key = AXIS_KEY[first.axis];
	const pitchMm = first.axis === 'x' ? array.spacingXMm : array.spacingYMm;
	const pitch = first.axis === 'x' ? sx : sy;
	const hint = smallest
		? `the smallest ${key} that builds here is ${(first.axis === 'x' ? smallest.x : smallest.y).toFixed(3)} (${((first.axis === 'x' ? smallest.x : smallest.y) * lambda0).toFixed(3)} mm)`
		: `no ${key} up to 2 builds with the other pitch kept: change the other pitch, a thinner feed substrate or a higher feed impedance`;
	throw new GeometryError(first.code, `array.${key} ${pitch} gives a pitch of ${pitchMm.toFixed(3)} mm along ${first.axis}, too short: ${first.what}; ${hint}`);
}

/** The first network piece that comes within `gapMm` of copper of an element it does not start at, as a misfit; null when none does. */
function networkCollision(pieces: readonly NetworkPiece[], boxes: readonly Bounds[], dx: number, dy: number, rows: number, columns: number, gapMm: number): ArrayMisfit | null {
	const footprint = boxes.reduce((b, q) => mergeBounds(b, q), emptyBounds);
	const cell = (v: number, pitch: number, n: number) => (pitch > 0 ? Math.min(n - 1, Math.max(0, Math.floor(v / pitch))) : 0);
	for (const p of pieces) {
		const pb = pieceBounds(p);
		const c0 = cell(pb.minXMm - footprint.maxXMm, dx, columns), c1 = cell(pb.maxXMm - footprint.minXMm, dx, columns) + 1;
		const r0 = cell(pb.minYMm - footprint.maxYMm, dy, rows), r1 = cell(pb.maxYMm - footprint.minYMm, dy, rows) + 1;
		for (let r = Math.max(0, r0 - 1); r <= Math.min(rows - 1, r1); r++) {
			for (let c = Math.max(0, c0 - 1); c <= Math.min(columns - 1, c1); c++) {
				if (p.element && p.element[0] === r && p.element[1] === c) continue;
				// each of the element's own shapes, not their union: a line may pass under a patch's corner region beside its feed line
				if (boxes.some((b) => overlaps(pb, shift(b, c * dx, r * dy), gapMm))) {
					const horizontal = p.from[1] === p.to[1];
					const axis: 'x' | 'y' = rows > 1 && horizontal ? 'y' : 'x';
					return { code: 'feed-network-crowded', axis, what: `the corporate feed passes within ${gapMm.toFixed(3)} mm of element (row ${r}, column ${c})` };
				}
			}
		}
	}
	return null;
}

