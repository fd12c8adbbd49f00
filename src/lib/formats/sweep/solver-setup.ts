// What a solver needs beside a point's geometry and stack (sweep document version 2): ports, frequency window, the
// frequency the materials hold at, and the dielectric's outline. Read from the point's artwork and sized design.
import type { Artwork, ArtworkLayer } from '../../artwork';
import { LENGTH_EPSILON_MM, contourBounds, type Bounds } from '../../geometry';
import type { SizedDesign } from '../../rf';
import type { z } from 'zod';
import type { solverPortSchema, solverSetupSchema } from '../../schemas/sweep-point';
import { probeOptionsSchema } from '../../schemas';

export type SolverPort = z.output<typeof solverPortSchema>;
export type SolverSetup = z.output<typeof solverSetupSchema>;

/**
 * Half-width of the band to simulate, as a fraction of the design frequency: wide enough for the first-pass
 * resonance error (a few per cent) and a laminate's εr spread to stay inside (common practice, no source).
 */
export const FREQUENCY_WINDOW_FRACTION = 0.2;

type LineEnd = { edge: 'bottom' | 'top' | 'left' | 'right'; location: [number, number]; lineWidthMm: number };

function copperLayers(artwork: Artwork): ArtworkLayer[] {
	return artwork.layers.filter((l) => l.function.kind === 'copper');
}

function copperIndex(layer: ArtworkLayer): number {
	return layer.function.kind === 'copper' ? layer.function.copperIndex : 0;
}

/** The copper nearest to `signal` in the stack that carries a ground plane: where the line's or probe's return current flows. */
function returnCopperOf(artwork: Artwork, signal: ArtworkLayer): ArtworkLayer {
	const coppers = copperLayers(artwork).filter((l) => l !== signal);
	const grounds = coppers.filter((l) => l.shapes.some((s) => s.role === 'ground'));
	const pool = grounds.length > 0 ? grounds : coppers;
	return [...pool].sort((a, b) => Math.abs(copperIndex(a) - copperIndex(signal)) - Math.abs(copperIndex(b) - copperIndex(signal)))[0];
}

/** Where a line's bounds meet a board edge (within LENGTH_EPSILON_MM), if they do. */
function edgeOf(b: Bounds, board: Artwork['board']): LineEnd | undefined {
	if (Math.abs(b.minYMm) <= LENGTH_EPSILON_MM) return { edge: 'bottom', location: [(b.minXMm + b.maxXMm) / 2, 0], lineWidthMm: b.maxXMm - b.minXMm };
	if (Math.abs(b.maxYMm - board.lengthMm) <= LENGTH_EPSILON_MM) return { edge: 'top', location: [(b.minXMm + b.maxXMm) / 2, board.lengthMm], lineWidthMm: b.maxXMm - b.minXMm };
	if (Math.abs(b.minXMm) <= LENGTH_EPSILON_MM) return { edge: 'left', location: [0, (b.minYMm + b.maxYMm) / 2], lineWidthMm: b.maxYMm - b.minYMm };
	if (Math.abs(b.maxXMm - board.widthMm) <= LENGTH_EPSILON_MM) return { edge: 'right', location: [board.widthMm, (b.minYMm + b.maxYMm) / 2], lineWidthMm: b.maxYMm - b.minYMm };
	return undefined;
}

/** Every microstrip line that ends on a board edge is a port (one for a single patch or a corporate-fed array). */
function edgePorts(artwork: Artwork, sized: SizedDesign): SolverPort[] {
	const ports: SolverPort[] = [];
	for (const layer of copperLayers(artwork)) {
		for (const shape of layer.shapes) {
			if (shape.role !== 'feed-line' || shape.geometry.kind !== 'region') continue;
			const end = edgeOf(contourBounds(shape.geometry.region.outer), artwork.board);
			if (!end) continue;
			ports.push({
				kind: 'edge-line',
				id: `port-${ports.length + 1}`,
				location: end.location,
				edge: end.edge,
				lineWidthMm: end.lineWidthMm,
				referenceImpedanceOhm: sized.input.feedLineImpedanceOhm,
				signalCopper: layer.id,
				returnCopper: returnCopperOf(artwork, layer).id
			});
		}
	}
	return ports;
}

function probePorts(artwork: Artwork, sized: SizedDesign): SolverPort[] {
	const coppers = copperLayers(artwork);
	const feed = sized.feed as { padDiameterMm?: number; clearanceDiameterMm?: number };
	// a probe-fed input carries its probe options; any other falls back to their defaults, as before the input was a union
	const options = sized.input.feed === 'probe' ? sized.input.probe : probeOptionsSchema.parse({});
	return artwork.drills
		.filter((d) => d.role === 'probe')
		.map((drill, i) => {
			const signal = coppers.find((l) => copperIndex(l) === drill.fromCopper) ?? coppers[0];
			const ret = coppers.find((l) => copperIndex(l) === drill.toCopper) ?? returnCopperOf(artwork, signal);
			const stated = artwork.metadata.probe;
			return {
				kind: 'coaxial-probe' as const,
				id: `port-${i + 1}`,
				location: [drill.center[0], drill.center[1]] as const,
				referenceImpedanceOhm: sized.input.targetImpedanceOhm,
				signalCopper: signal.id,
				returnCopper: ret.id,
				model: stated?.model ?? 'solid-pin',
				modelStated: stated !== undefined,
				pinDiameterMm: drill.diameterMm,
				platingThicknessUm: stated?.platingThicknessUm ?? null,
				padDiameterMm: feed.padDiameterMm ?? options.padDiameterMm ?? drill.diameterMm,
				antiPadDiameterMm: feed.clearanceDiameterMm ?? options.clearanceDiameterMm
			};
		});
}

/** The solver set-up of one sized point. */
export function solverSetupOf(artwork: Artwork, sized: SizedDesign): SolverSetup {
	const { widthMm, lengthMm } = artwork.board;
	const f0 = sized.frequencyHz;
	return {
		ports: sized.feedKind === 'probe' ? probePorts(artwork, sized) : edgePorts(artwork, sized),
		frequencyWindow: { startHz: f0 * (1 - FREQUENCY_WINDOW_FRACTION), stopHz: f0 * (1 + FREQUENCY_WINDOW_FRACTION) },
		materialsHoldAtHz: f0,
		dielectricOutline: {
			origin: 'board-lower-left',
			contour: [
				[0, 0],
				[widthMm, 0],
				[widthMm, lengthMm],
				[0, lengthMm]
			]
		}
	};
}
