// A sized design → its Artwork: top copper, ground with clearance, profile, optional masks, drills and the stack.
import { GeometryError, createRectangleContour, type Point } from '../geometry';
import { isLayeredFeed } from '../rf/feed-kinds';
import type { SizedDesign } from '../rf/sized-design';
import { buildDimensions } from './build-dimensions';
import { buildLayeredStack, buildStack } from './build-stack';
import { buildExtendedArtwork } from './build-extended-artwork';
import { profileLayer } from './profile-layer';
import { buildTopCopper } from './build-top-copper';
import { withLaunch } from './build-launch';
import { withLegend } from './build-legend';
import { withMountingHoles } from './build-mounting-holes';
import { probeModelOf } from './probe-model';
import type { Artwork, ArtworkDrill, ArtworkLayer, ArtworkShape } from './types';

/** Top copper left under the mask when it covers the patch: the radiating copper. */
const COVERED_ROLES: readonly ArtworkShape['role'][] = ['patch', 'notch', 'tuning-stub'];

/** Pen width for the board profile line: the outline is its centre line; width only makes it visible. */

/**
 * Builds the artwork. The board spans (0, 0)–(ground.widthMm, ground.lengthMm); the patch is
 * centred on it and the feed runs down (−y) to the board edge at y = 0.
 */
export function buildArtwork(sized: SizedDesign): Artwork {
	artworkBuilds += 1;
	// the connector launch on the drawn element, then the user's mounting holes, then the legend, which keeps clear of both
	return withLegend(withMountingHoles(withLaunch(drawArtwork(sized), sized), sized), sized);
}

/** Artworks built so far by this module instance (one per thread): lets a worker task report what it drew. */
let artworkBuilds = 0;
export function artworkBuildCount(): number {
	return artworkBuilds;
}

function drawArtwork(sized: SizedDesign): Artwork {
	if (needsExtendedArtwork(sized)) return buildExtendedArtwork(sized);
	const { widthMm: boardW, lengthMm: boardL } = sized.ground;
	if (!(boardW > 0 && boardL > 0)) throw new GeometryError('degenerate-shape', `ground.widthMm and ground.lengthMm must be positive (got ${boardW}, ${boardL})`);
	const center: Point = [boardW / 2, boardL / 2];
	const top = buildTopCopper(sized, center);
	const board = { outer: createRectangleContour(0, 0, boardW, boardL), holes: [] };

	const groundShapes: ArtworkShape[] = [{ id: 'ground', role: 'ground', polarity: 'dark', geometry: { kind: 'region', region: board } }];
	const drills: ArtworkDrill[] = [];
	if (sized.feed.kind === 'probe' && top.probeCenter) {
		const { clearanceDiameterMm, drillDiameterMm } = sized.feed;
		const [px, py] = top.probeCenter;
		const r = clearanceDiameterMm / 2;
		if (px - r < 0 || py - r < 0 || px + r > boardW || py + r > boardL) {
			throw new GeometryError('clearance-outside-ground', `the ground clearance (diameter ${clearanceDiameterMm} mm) must lie inside the ground plane`);
		}
		groundShapes.push({ id: 'clearance', role: 'clearance', polarity: 'clear', geometry: { kind: 'circle', center: top.probeCenter, diameterMm: clearanceDiameterMm } });
		drills.push({ id: 'probe-drill', role: 'probe', plated: true, center: top.probeCenter, diameterMm: drillDiameterMm, fromCopper: 1, toCopper: 2 });
	}

	const layers: ArtworkLayer[] = [
		{ id: 'copper-top', title: 'Top copper (patch and feed)', function: { kind: 'copper', copperIndex: 1, side: 'top' }, shapes: top.shapes, voids: top.voids },
		{ id: 'copper-bottom', title: 'Bottom copper (ground)', function: { kind: 'copper', copperIndex: 2, side: 'bottom' }, shapes: groundShapes, voids: [] },
		profileLayer(board.outer)
	];
	if (sized.input.solderMask) {
		// Mask off the antenna: solder mask over the patch would shift its resonance (common practice, no source).
		// Covered (maskCoverage "covered"): the patch stays under the mask, the sizing has allowed for it, and only the feed is opened.
		const covered = sized.input.maskCoverage === 'covered';
		const topOpenings = top.shapes.filter((s) => !(covered && COVERED_ROLES.includes(s.role))).map((s): ArtworkShape => ({ ...s, id: `mask-top-${s.id}`, role: 'mask-opening', polarity: 'dark' }));
		const bottomOpenings: ArtworkShape[] = drills.map((d) => ({
			id: `mask-bottom-${d.id}`,
			role: 'mask-opening',
			polarity: 'dark',
			geometry: { kind: 'circle', center: d.center, diameterMm: sized.feed.kind === 'probe' ? sized.feed.clearanceDiameterMm : d.diameterMm }
		}));
		layers.push({ id: 'mask-top', title: 'Top solder mask (openings)', function: { kind: 'solder-mask', side: 'top' }, shapes: topOpenings, voids: [] });
		layers.push({ id: 'mask-bottom', title: 'Bottom solder mask (openings)', function: { kind: 'solder-mask', side: 'bottom' }, shapes: bottomOpenings, voids: [] });
	}

	return {
		board: { widthMm: boardW, lengthMm: boardL },
		layers,
		drills,
		stack: sized.layerStack ? buildLayeredStack(sized) : buildStack(sized),
		dimensions: buildDimensions(sized, { center, patchEdgeYMm: top.patchEdgeYMm, feedStartYMm: 0, board: { widthMm: boardW, lengthMm: boardL } }),
		metadata: {
			designName: sized.input.name,
			shape: sized.shape,
			feedKind: sized.feedKind,
			frequencyHz: sized.frequencyHz,
			copperLayerCount: 2,
			...(probeModelOf(sized) ? { probe: probeModelOf(sized) } : {})
		}
	};
}

/** Layered feeds, a parasitic patch and arrays take the extended builder; a two-copper stack stays here. */
export function needsExtendedArtwork(sized: SizedDesign): boolean {
	return sized.array !== undefined || sized.parasitic !== undefined || isLayeredFeed(sized.feed);
}
