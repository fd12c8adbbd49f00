// Test helper: small hand-built Artwork values, each clean under the built-in profile until a test nudges one number.
import type { Artwork, ArtworkDrill, ArtworkLayer, ArtworkShape, ShapeRole } from '../../../src/lib/artwork';
import { createCircleContour, createPolygonContour, createRectangleContour, type Point } from '../../../src/lib/geometry';

export const BOARD_MM = 40;

export const rect = (id: string, role: ShapeRole, x0: number, y0: number, x1: number, y1: number, polarity: 'dark' | 'clear' = 'dark'): ArtworkShape => ({
	id,
	role,
	polarity,
	geometry: { kind: 'region', region: { outer: createRectangleContour(x0, y0, x1 - x0, y1 - y0), holes: [] } }
});

export const disc = (id: string, role: ShapeRole, center: Point, diameterMm: number, polarity: 'dark' | 'clear' = 'dark'): ArtworkShape => ({
	id,
	role,
	polarity,
	geometry: { kind: 'circle', center, diameterMm }
});

/** A circle drawn as a region of two arcs (how a circular patch arrives). */
export const roundRegion = (id: string, role: ShapeRole, center: Point, radiusMm: number): ArtworkShape => ({
	id,
	role,
	polarity: 'dark',
	geometry: { kind: 'region', region: { outer: createCircleContour(center, radiusMm), holes: [] } }
});

export const polygon = (id: string, role: ShapeRole, points: Point[]): ArtworkShape => ({
	id,
	role,
	polarity: 'dark',
	geometry: { kind: 'region', region: { outer: createPolygonContour(points), holes: [] } }
});

export function craftArtwork(opts: { top: ArtworkShape[]; voids?: ArtworkShape[]; bottom?: ArtworkShape[]; drills?: ArtworkDrill[]; boardMm?: number }): Artwork {
	const b = opts.boardMm ?? BOARD_MM;
	const layers: ArtworkLayer[] = [
		{ id: 'copper-top', title: 'Top copper', function: { kind: 'copper', copperIndex: 1, side: 'top' }, shapes: opts.top, voids: opts.voids ?? [] },
		{
			id: 'copper-bottom',
			title: 'Bottom copper',
			function: { kind: 'copper', copperIndex: 2, side: 'bottom' },
			shapes: opts.bottom ?? [rect('ground', 'ground', 0, 0, b, b)],
			voids: []
		},
		{
			id: 'profile',
			title: 'Board profile',
			function: { kind: 'profile' },
			shapes: [{ id: 'profile', role: 'profile', polarity: 'dark', geometry: { kind: 'outline', contour: createRectangleContour(0, 0, b, b), strokeWidthMm: 0.1 } }],
			voids: []
		}
	];
	return {
		board: { widthMm: b, lengthMm: b },
		layers,
		drills: opts.drills ?? [],
		stack: [],
		dimensions: [],
		metadata: { designName: 'crafted', shape: 'rectangular', feedKind: 'edge', frequencyHz: 2.4e9, copperLayerCount: 2 }
	};
}

/** Patch 10..30 × 15..35 with an edge feed of `feedWidthMm` from the board edge. */
export function edgeFedArtwork(feedWidthMm = 2, patchLeftMm = 10): Artwork {
	return craftArtwork({
		top: [rect('patch', 'patch', patchLeftMm, 15, 30, 35), rect('feed-line', 'feed-line', 20 - feedWidthMm / 2, 0, 20 + feedWidthMm / 2, 15)]
	});
}

/** Patch with an inset notch: line width 2, gap `gapMm` each side, 5 mm deep; notch voids as the artwork builder keeps them. */
export function insetFedArtwork(gapMm: number): Artwork {
	const cx = 20;
	const half = 1;
	const ch = half + gapMm;
	const patch = polygon('patch', 'patch', [
		[10, 15],
		[cx - ch, 15],
		[cx - ch, 20],
		[cx + ch, 20],
		[cx + ch, 15],
		[30, 15],
		[30, 35],
		[10, 35]
	]);
	return craftArtwork({
		top: [patch, rect('feed-line', 'feed-line', cx - half, 0, cx + half, 20)],
		voids: [rect('notch-left', 'notch', cx - ch, 15, cx - half, 20), rect('notch-right', 'notch', cx + half, 15, cx + ch, 20)]
	});
}

/** Probe-fed patch: drill, a concentric top pad and a ground clearance. */
export function probeFedArtwork(opts: { drillMm: number; padMm: number; clearanceMm: number }): Artwork {
	const at: Point = [20, 22];
	return craftArtwork({
		top: [rect('patch', 'patch', 10, 15, 30, 35), disc('probe-pad', 'probe-pad', at, opts.padMm)],
		bottom: [rect('ground', 'ground', 0, 0, BOARD_MM, BOARD_MM), disc('clearance', 'clearance', at, opts.clearanceMm, 'clear')],
		drills: [{ id: 'probe-drill', role: 'probe', plated: true, center: at, diameterMm: opts.drillMm, fromCopper: 1, toCopper: 2 }]
	});
}

/**
 * The edge-fed patch with an edge launch: 3 mm signal pad on the 2 mm line, ground pads 2 mm wide at
 * `gapMm` each side, and 0.4 mm vias (default one per pad at its centre, y = 1.5); `vias` replaces them.
 */
export function edgeLaunchedArtwork(opts: { gapMm?: number; vias?: { center: Point; diameterMm?: number }[] } = {}): Artwork {
	const g = opts.gapMm ?? 0.5;
	const left: [number, number] = [19 - g - 2, 19 - g];
	const right: [number, number] = [21 + g, 23 + g];
	const vias: { center: Point; diameterMm?: number }[] = opts.vias ?? [{ center: [(left[0] + left[1]) / 2, 1.5] }, { center: [(right[0] + right[1]) / 2, 1.5] }];
	return craftArtwork({
		top: [
			...edgeFedArtwork().layers[0].shapes,
			rect('launch-signal', 'launch-signal', 19, 0, 21, 3),
			rect('launch-ground-left', 'launch-ground', left[0], 0, left[1], 3),
			rect('launch-ground-right', 'launch-ground', right[0], 0, right[1], 3)
		],
		drills: vias.map((v, i): ArtworkDrill => ({ id: `launch-via-${i}`, role: 'launch-via', plated: true, center: v.center, diameterMm: v.diameterMm ?? 0.4, fromCopper: 1, toCopper: 2 }))
	});
}
