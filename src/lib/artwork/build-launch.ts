// The connector launch added to a built artwork: an edge launch (signal pad, top ground pads, via rows) or a back-side footprint.
import { GeometryError, createRectangleContour, type Point } from '../geometry';
import { feedLineOf } from '../rf/feed-kinds';
import { analyzeGroundedCoplanar, groundedCoplanarGapMm } from '../rf/grounded-coplanar';
import type { SizedDesign } from '../rf/sized-design';
import type { BackLaunch, EdgeLaunch } from '../schemas/launch';
import type { Artwork, ArtworkDrill, ArtworkLayer, ArtworkShape } from './types';

/** Within this distance of y = 0 a line's corner counts as on the board edge. */
const ON_EDGE_MM = 1e-6;

const rectShape = (id: string, role: ArtworkShape['role'], x0: number, y0: number, x1: number, y1: number): ArtworkShape => ({
	id,
	role,
	polarity: 'dark',
	geometry: { kind: 'region', region: { outer: createRectangleContour(x0, y0, x1 - x0, y1 - y0), holes: [] } }
});

/** The artwork with the design's launch added; the same artwork when the design has none. */
export function withLaunch(artwork: Artwork, sized: SizedDesign): Artwork {
	const launch = sized.input.launch;
	if (!launch || launch.kind === 'none') return artwork;
	return launch.kind === 'edge' ? withEdgeLaunch(artwork, sized, launch) : withBackLaunch(artwork, launch);
}

/** Where the line meets the board edge on the top copper: its centre x and width. */
function lineAtEdge(top: ArtworkLayer): { centerXMm: number; widthMm: number } {
	for (const s of top.shapes) {
		if (s.polarity !== 'dark' || s.geometry.kind !== 'region') continue;
		if (!['feed-line', 'feed-network', 'network-transformer', 'transformer'].includes(s.role)) continue;
		const o = s.geometry.region.outer;
		const xs = [o.start, ...o.segments.map((seg) => seg.to)].filter((p) => Math.abs(p[1]) <= ON_EDGE_MM).map((p) => p[0]);
		if (xs.length < 2) continue;
		const lo = xs.reduce((m, x) => Math.min(m, x), Infinity);
		const hi = xs.reduce((m, x) => Math.max(m, x), -Infinity);
		if (hi - lo > ON_EDGE_MM) return { centerXMm: (lo + hi) / 2, widthMm: hi - lo };
	}
	throw new GeometryError('launch-does-not-fit', 'launch.kind "edge": no feed line reaches the board edge (y = 0) on the top copper');
}

/** The dielectric between the two coppers as one layer: Σh and the series permittivity Σh / Σ(h/εr). */
function substrateOf(artwork: Artwork): { heightMm: number; relativePermittivity: number } {
	const layers = artwork.stack.filter((l) => l.kind === 'dielectric');
	const heightMm = layers.reduce((a, l) => a + l.thicknessMm, 0);
	const relativePermittivity = heightMm / layers.reduce((a, l) => a + l.thicknessMm / l.relativePermittivity, 0);
	return { heightMm, relativePermittivity };
}

/**
 * Edge launch at y = 0: the line continues as a signal pad `lengthMm` long between two top ground pads
 * (`groundWidthMm` wide, `gapMm` from the line), each tied to the bottom ground by `viaRows` rows of
 * plated vias. The first row's centres sit `viaInsetMm` from the pad's gap edge, rows `viaPitchMm`
 * apart; along the line the vias step `viaPitchMm` down from half a pitch below the pads' inner end.
 */
function withEdgeLaunch(artwork: Artwork, sized: SizedDesign, launch: EdgeLaunch): Artwork {
	const topIndex = artwork.layers.findIndex((l) => l.function.kind === 'copper' && l.function.copperIndex === 1);
	const top = artwork.layers[topIndex];
	const { centerXMm: xc, widthMm: w } = lineAtEdge(top);
	const lineImpedanceOhm = sized.array?.network.line.impedanceOhm ?? feedLineOf(sized.feed)?.impedanceOhm ?? sized.input.feedLineImpedanceOhm;
	const substrate = substrateOf(artwork);
	const solved = launch.gapMm === undefined ? groundedCoplanarGapMm({ stripWidthMm: w, ...substrate, impedanceOhm: lineImpedanceOhm }) : launch.gapMm;
	if (solved === null) {
		throw new GeometryError(
			'launch-does-not-fit',
			`launch.gapMm: no gap gives the line's ${lineImpedanceOhm.toFixed(1)} Ω in a grounded-coplanar section of a ${w.toFixed(3)} mm line on h = ${substrate.heightMm} mm; state launch.gapMm`
		);
	}
	const g = solved;
	const L = launch.lengthMm;
	const pw = launch.groundWidthMm;
	const half = w / 2;
	const shapes: ArtworkShape[] = [
		rectShape('launch-signal', 'launch-signal', xc - half, 0, xc + half, L),
		rectShape('launch-ground-left', 'launch-ground', xc - half - g - pw, 0, xc - half - g, L),
		rectShape('launch-ground-right', 'launch-ground', xc + half + g, 0, xc + half + g + pw, L)
	];
	const drills: ArtworkDrill[] = [];
	const alongCount = Math.max(1, Math.floor(L / launch.viaPitchMm + 1e-9));
	const bottomCopper = artwork.metadata.copperLayerCount;
	for (const [side, sign] of [['left', -1], ['right', 1]] as const) {
		for (let r = 0; r < launch.viaRows; r++) {
			const x = xc + sign * (half + g + launch.viaInsetMm + r * launch.viaPitchMm);
			for (let j = 0; j < alongCount; j++) {
				const center: Point = [x, L - (j + 0.5) * launch.viaPitchMm];
				drills.push({ id: `launch-via-${side}-${r}-${j}`, role: 'launch-via', plated: true, center, diameterMm: launch.viaDrillMm, fromCopper: 1, toCopper: bottomCopper });
			}
		}
	}
	const layers = artwork.layers.map((layer, i) => {
		if (i === topIndex) return { ...layer, shapes: [...layer.shapes, ...shapes] };
		if (layer.function.kind === 'solder-mask' && layer.function.side === 'top') {
			return { ...layer, shapes: [...layer.shapes, ...shapes.map((s): ArtworkShape => ({ ...s, id: `mask-top-${s.id}`, role: 'mask-opening' }))] };
		}
		return layer;
	});
	const launchImpedanceOhm = analyzeGroundedCoplanar({ stripWidthMm: w, gapMm: g, ...substrate }).impedanceOhm;
	return {
		...artwork,
		layers,
		drills: [...artwork.drills, ...drills],
		metadata: {
			...artwork.metadata,
			launch: { kind: 'edge', lengthMm: L, signalWidthMm: w, gapMm: g, gapSolved: launch.gapMm === undefined, groundWidthMm: pw, lineImpedanceOhm, launchImpedanceOhm, viaDrillMm: launch.viaDrillMm, viaCount: drills.length }
		}
	};
}

/**
 * Back-side footprint under the probe: the pin hole is the probe drill and the anti-pad its ground
 * clearance; mount "pad" adds a square ground pad on the bottom copper around them (the clearance
 * still cut through it), mount "flange" four plated holes on a square centred on the pin.
 */
function withBackLaunch(artwork: Artwork, launch: BackLaunch): Artwork {
	const pin = artwork.drills.find((d) => d.role === 'probe');
	const bottomIndex = artwork.layers.findIndex((l) => l.function.kind === 'copper' && l.function.side === 'bottom');
	if (!pin || bottomIndex < 0) throw new GeometryError('launch-does-not-fit', 'launch.kind "back": the design has no probe drill to launch from');
	const bottom = artwork.layers[bottomIndex];
	const clearance = bottom.shapes.find((s) => s.role === 'clearance' && s.geometry.kind === 'circle');
	const antiPadDiameterMm = clearance?.geometry.kind === 'circle' ? clearance.geometry.diameterMm : pin.diameterMm;
	const [px, py] = pin.center;
	const layers = [...artwork.layers];
	const drills = [...artwork.drills];
	if (launch.mount === 'pad') {
		const h = launch.padSideMm / 2;
		const pad = rectShape('launch-back-pad', 'launch-back-pad', px - h, py - h, px + h, py + h);
		// the pad goes under the clearance, so the anti-pad still opens it around the pin
		const at = bottom.shapes.findIndex((s) => s.role === 'clearance');
		const shapes = [...bottom.shapes];
		shapes.splice(at < 0 ? shapes.length : at, 0, pad);
		layers[bottomIndex] = { ...bottom, shapes };
		const mask = layers.findIndex((l) => l.function.kind === 'solder-mask' && l.function.side === 'bottom');
		if (mask >= 0) layers[mask] = { ...layers[mask], shapes: [...layers[mask].shapes, { ...pad, id: 'mask-bottom-launch-back-pad', role: 'mask-opening' }] };
	} else {
		const h = launch.flangeSpacingMm / 2;
		const corners: [string, Point][] = [
			['sw', [px - h, py - h]],
			['se', [px + h, py - h]],
			['ne', [px + h, py + h]],
			['nw', [px - h, py + h]]
		];
		for (const [name, center] of corners) {
			drills.push({ id: `launch-flange-${name}`, role: 'launch-flange', plated: true, center, diameterMm: launch.flangeDrillMm, fromCopper: 1, toCopper: artwork.metadata.copperLayerCount });
		}
	}
	return {
		...artwork,
		layers,
		drills,
		metadata: {
			...artwork.metadata,
			launch: {
				kind: 'back',
				mount: launch.mount,
				center: pin.center,
				antiPadDiameterMm,
				padSideMm: launch.mount === 'pad' ? launch.padSideMm : null,
				flangeDrillMm: launch.mount === 'flange' ? launch.flangeDrillMm : null,
				flangeSpacingMm: launch.mount === 'flange' ? launch.flangeSpacingMm : null
			}
		}
	};
}
