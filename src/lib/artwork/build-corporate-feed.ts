// The corporate feed of an array: binary trees of T-junctions (λg/4 transformers in the arms) from every element's feed point to one port.
import { GeometryError, createPolygonContour, type Bounds, type Point } from '../geometry';
import type { SizedArray } from '../rf/sized-design';
import type { ArtworkShape } from './types';

/** A straight piece of the network along its centre line. */
export interface NetworkPiece {
	readonly from: Point;
	readonly to: Point;
	readonly widthMm: number;
	/** 'feed-line' for the port line that meets the board edge (as a single design's feed line does). */
	readonly role: 'feed-network' | 'network-transformer' | 'feed-line';
	/** Ends that meet another piece at a corner or a junction: drawn half a width longer so the copper overlaps. */
	readonly extendFrom: boolean;
	readonly extendTo: boolean;
	/** The element (row, column) this piece starts at, if any: its footprint may touch this piece. */
	readonly element?: readonly [number, number];
}

export interface CorporateFeedLayout {
	readonly pieces: NetworkPiece[];
	/** Where the port line ends (the board edge is put here). */
	readonly port: Point;
}

/**
 * Lays the network out. Rows: a tree under each row, level k at Yf − (k−1)·pitch, arms horizontal.
 * Several rows: each row's root drops one pitch and runs left past every element to a column of
 * trees stepping left by one pitch per level, arms vertical. The root's trunk runs down to the port.
 * Every path from the port to an element has the same length, so the elements are fed in phase.
 * `feedPoints[r][c]` lie on a grid (same y per row, same x per column).
 */
export function layoutCorporateFeed(feedPoints: readonly (readonly Point[])[], array: SizedArray, leftmostCopperXMm: number, lowestCopperYMm: number, marginMm: number): CorporateFeedLayout {
	const { line, transformer, levelPitchMm: P, clearanceMm } = array.network;
	const w = line.widthMm;
	const wt = transformer.widthMm;
	const qt = transformer.lengthMm;
	const pieces: NetworkPiece[] = [];
	const piece = (from: Point, to: Point, widthMm: number, role: NetworkPiece['role'], extendFrom: boolean, extendTo: boolean, element?: readonly [number, number]) =>
		pieces.push({ from, to, widthMm, role, extendFrom, extendTo, element });

	/** An arm from a child node to the junction: Z0 line, then the λg/4 transformer ending at the junction. */
	const arm = (child: Point, junction: Point, element?: readonly [number, number]) => {
		const horizontal = child[1] === junction[1];
		const length = horizontal ? Math.abs(junction[0] - child[0]) : Math.abs(junction[1] - child[1]);
		if (!(length >= qt + w)) {
			throw new GeometryError(
				'network-arm-too-short',
				`a corporate-feed arm (${length.toFixed(3)} mm) must hold its λg/4 transformer (${qt.toFixed(3)} mm) plus one line width (${w.toFixed(3)} mm): raise array.spacing${horizontal ? 'X' : 'Y'}Wavelengths`
			);
		}
		const sign = horizontal ? Math.sign(junction[0] - child[0]) : Math.sign(junction[1] - child[1]);
		const split: Point = horizontal ? [junction[0] - sign * qt, junction[1]] : [junction[0], junction[1] - sign * qt];
		piece(child, split, w, 'feed-network', true, false, element);
		piece(split, junction, wt, 'network-transformer', false, false);
	};

	const rows = feedPoints.length;
	const columns = feedPoints[0].length;
	const roots: Point[] = [];
	for (let r = 0; r < rows; r++) {
		let nodes: { at: Point; element?: readonly [number, number] }[] = feedPoints[r].map((at, c) => ({ at, element: [r, c] as const }));
		let y = feedPoints[r][0][1];
		let level = 0;
		while (nodes.length > 1) {
			const next: { at: Point }[] = [];
			for (let i = 0; i < nodes.length; i += 2) {
				const a = nodes[i], b = nodes[i + 1];
				const drop = (n: { at: Point; element?: readonly [number, number] }): Point => {
					if (level === 0) return n.at;
					const to: Point = [n.at[0], y];
					piece(n.at, to, w, 'feed-network', false, true);
					return to;
				};
				const pa = drop(a), pb = drop(b);
				const junction: Point = [(pa[0] + pb[0]) / 2, y];
				arm(pa, junction, level === 0 ? a.element : undefined);
				arm(pb, junction, level === 0 ? b.element : undefined);
				next.push({ at: junction });
			}
			nodes = next;
			level++;
			y -= P;
		}
		roots.push(nodes[0].at);
	}

	if (rows === 1) {
		const root = roots[0];
		const port: Point = [root[0], Math.min(root[1] - P, lowestCopperYMm) - marginMm];
		piece(root, port, w, 'feed-line', false, false, columns === 1 ? [0, 0] : undefined);
		return { pieces, port };
	}

	// several rows: connectors to a column of trees on the left
	const xL = leftmostCopperXMm - clearanceMm - w / 2;
	let nodes: Point[] = roots.map((root, r) => {
		const corner: Point = [root[0], root[1] - P];
		piece(root, corner, w, 'feed-network', false, true, columns === 1 ? [r, 0] : undefined);
		const arrival: Point = [xL, corner[1]];
		piece(corner, arrival, w, 'feed-network', true, true);
		return arrival;
	});
	let x = xL;
	while (nodes.length > 1) {
		const next: Point[] = [];
		for (let i = 0; i < nodes.length; i += 2) {
			const a = nodes[i], b = nodes[i + 1];
			const pa: Point = a[0] === x ? a : [x, a[1]];
			const pb: Point = b[0] === x ? b : [x, b[1]];
			if (pa !== a) piece(a, pa, w, 'feed-network', false, true);
			if (pb !== b) piece(b, pb, w, 'feed-network', false, true);
			const junction: Point = [x, (pa[1] + pb[1]) / 2];
			arm(pa, junction);
			arm(pb, junction);
			next.push(junction);
		}
		nodes = next;
		x -= P;
	}
	const root = nodes[0];
	const corner: Point = [x, root[1]];
	piece(root, corner, w, 'feed-network', false, true);
	const lowest = pieces.reduce((low, p) => Math.min(low, Math.min(p.from[1], p.to[1]) - p.widthMm / 2), lowestCopperYMm);
	const port: Point = [x, lowest - marginMm];
	piece(corner, port, w, 'feed-line', true, false);
	return { pieces, port };
}

/** A piece as a rectangle region, half a width longer at each end that meets another piece at an angle. */
export function pieceShape(p: NetworkPiece, id: string, dx = 0, dy = 0): ArtworkShape {
	const h = p.widthMm / 2;
	const [x0, y0] = p.from, [x1, y1] = p.to;
	let minX: number, maxX: number, minY: number, maxY: number;
	if (y0 === y1) {
		const left = x0 < x1, eL = left ? p.extendFrom : p.extendTo, eR = left ? p.extendTo : p.extendFrom;
		minX = Math.min(x0, x1) - (eL ? h : 0);
		maxX = Math.max(x0, x1) + (eR ? h : 0);
		minY = y0 - h;
		maxY = y0 + h;
	} else {
		const down = y0 < y1, eB = down ? p.extendFrom : p.extendTo, eT = down ? p.extendTo : p.extendFrom;
		minY = Math.min(y0, y1) - (eB ? h : 0);
		maxY = Math.max(y0, y1) + (eT ? h : 0);
		minX = x0 - h;
		maxX = x0 + h;
	}
	// corners computed directly (not origin + size) so pieces meeting end to end share exact coordinates
	const ax0 = minX + dx, ax1 = maxX + dx, ay0 = minY + dy, ay1 = maxY + dy;
	const outer = createPolygonContour([[ax0, ay0], [ax1, ay0], [ax1, ay1], [ax0, ay1]]);
	return { id, role: p.role, polarity: 'dark', geometry: { kind: 'region', region: { outer, holes: [] } } };
}

/** Bounds of a piece's rectangle. */
export function pieceBounds(p: NetworkPiece): Bounds {
	const g = pieceShape(p, '').geometry;
	if (g.kind !== 'region') throw new Error('piece is a region');
	const o = g.region.outer;
	const pts = [o.start, ...o.segments.map((s) => s.to)];
	return pts.reduce((b, q) => ({ minXMm: Math.min(b.minXMm, q[0]), minYMm: Math.min(b.minYMm, q[1]), maxXMm: Math.max(b.maxXMm, q[0]), maxYMm: Math.max(b.maxYMm, q[1]) }), {
		minXMm: Infinity,
		minYMm: Infinity,
		maxXMm: -Infinity,
		maxYMm: -Infinity
	});
}
