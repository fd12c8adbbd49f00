// Artwork + stack → the full-wave model: materials, copper sheets, probe, lumped port, boundaries, mesh.
import type { Artwork, ArtworkShape, StackLayer } from '../artwork';
import { contourBounds, createCircleContour, createPolygonContour, flattenContour, isPointInRing, unionRegions, type Contour, type Point, type Region } from '../geometry';
import { InputError } from '../schemas/input-error';
import type { FieldCheckMode } from '../schemas/field-check';
import { SPEED_OF_LIGHT_M_PER_S, VACUUM_PERMITTIVITY_F_PER_M, freeSpaceWavelengthMm } from '../units';
import { buildMesh, type AxisFeatures, type AxisPlan, type MetalEdge } from './mesh';
import type { FieldModel, FieldModelOptions, ModelPrimitive, ModelProperty } from './types';

/** The check band: target ± 30 %, what the Gaussian excitation spans and the S11 is reported over. */
export const CHECK_BAND_FRACTION = 0.3;
/**
 * Energy decay that ends a run, dB below the peak. −35 rather than −40: cutting the port series of the three bench
 * cases' standard runs (openEMS 0.0.35, run to −40 dB) where the engine's energy first read −35 dB moved the
 * resonance by −0.007 %, 0.000 % and +0.017 % and the S11 at resonance by +0.5, 0.0 and −0.2 dB (on −34, −28 and
 * −15 dB dips), and the S11 at the target by ≤ 0.2 dB, while saving 13 %, 0 % and 35 % of the timesteps (the
 * circular patch's energy lingers between −25 and −35 dB long after its port has rung down). −30 dB moved the
 * inset's −34 dB dip by 4 dB, so it was not taken.
 */
export const END_CRITERION_DB = -35;
/** Cells per wavelength in the dielectric at the band's top, by mode (before the refinement factor). */
export const CELLS_PER_WAVELENGTH: Record<FieldCheckMode, number> = { quick: 12, standard: 20, accurate: 20 };
/**
 * Fewest cells through each dielectric layer, by mode (before the refinement factor). Four cells
 * put a 1.57 mm board's measured patch (R6 of the Accuracy table) 0.25 % lower than eight and
 * 0.30 % lower than twelve (Rmax 4.888 / 4.900 / 4.903 GHz on openEMS 0.0.35): the fields under
 * the patch edge vary over a fraction of h, so standard and accurate take eight; quick, a first
 * look, keeps four.
 */
export const MIN_CELLS_PER_LAYER: Record<FieldCheckMode, number> = { quick: 4, standard: 8, accurate: 8 };
/** The thirds-rule cell at metal edges, as a fraction of the largest dielectric cell. */
export const EDGE_CELL_FRACTION = 1 / 3;
/** Distance from the board to the absorbing boundaries, in free-space wavelengths at the target. */
export const BOUNDARY_DISTANCE_WAVELENGTHS = 0.25;
/** Hard cap on engine timesteps; the end criterion or the time budget normally stops a run first. */
export const MAX_TIMESTEPS = 400_000;
/** Accurate mode's second run refines every cell by this factor. */
export const ACCURATE_REFINEMENT = 1.5;

/** Chord tolerance when a round outline (circular patch, pad) becomes the engine's polygon. */
const ROUND_CHORD_TOLERANCE_MM = 0.01;
const PRIORITY_DIELECTRIC = 0;
const PRIORITY_COPPER = 10;
const PRIORITY_PIN = 20;
const PRIORITY_PORT = 5;

/** A design the model cannot hold: bad input for the Field check (400/422, exit 2), never a crash. */
const unsupported = (message: string, value: unknown = 'this design') => new InputError([{ path: 'feed', value, message }]);

/** κ = 2π·f·ε0·εr·tanδ: the conductivity whose loss equals tanδ at f (exact at f only). */
export function conductivityForLossTangent(relativePermittivity: number, lossTangent: number, frequencyHz: number): number {
	return 2 * Math.PI * frequencyHz * VACUUM_PERMITTIVITY_F_PER_M * relativePermittivity * lossTangent;
}

/**
 * The dark copper of one layer as outlines: the shapes are united first (a feed line that only
 * touches the patch along an edge would otherwise meet it between mesh lines and may not connect).
 */
function copperOutlines(shapes: readonly ArtworkShape[]): CopperLayerOutlines {
	const regions: Region[] = shapes
		.filter((s) => s.polarity === 'dark')
		.map((s) => {
			const g = s.geometry;
			// round outlines become chords first: the boolean operations take straight contours only
			const straight = (c: Contour) => createPolygonContour(flattenContour(c, ROUND_CHORD_TOLERANCE_MM));
			if (g.kind === 'region') return { outer: straight(g.region.outer), holes: g.region.holes.map(straight) };
			if (g.kind === 'circle') return { outer: straight(createCircleContour(g.center, g.diameterMm / 2)), holes: [] };
			throw unsupported(`the Field check cannot model outline shape "${s.id}" as copper`);
		});
	const rings = unionRegions(regions).map((r) => {
		if (r.holes.length > 0) throw unsupported('the Field check cannot model copper with holes');
		return flattenContour(r.outer, ROUND_CHORD_TOLERANCE_MM);
	});
	// exact extremes of the shapes as drawn (a chorded circle may miss its top and bottom points)
	const extremes: [number[], number[]] = [[], []];
	for (const s of shapes.filter((sh) => sh.polarity === 'dark')) {
		const g = s.geometry;
		const b = g.kind === 'circle' ? { minXMm: g.center[0] - g.diameterMm / 2, maxXMm: g.center[0] + g.diameterMm / 2, minYMm: g.center[1] - g.diameterMm / 2, maxYMm: g.center[1] + g.diameterMm / 2 } : g.kind === 'region' ? contourBounds(g.region.outer) : null;
		if (!b) continue;
		extremes[0].push(b.minXMm, b.maxXMm);
		extremes[1].push(b.minYMm, b.maxYMm);
	}
	return { rings, extremes };
}

/** One copper layer for the model: its united outlines and the exact extremes of its shapes per axis. */
interface CopperLayerOutlines {
	rings: Point[][];
	extremes: [x: number[], y: number[]];
}

function shapeOutline(shape: ArtworkShape): Point[] {
	const g = shape.geometry;
	if (g.kind === 'region') {
		if (g.region.holes.length > 0) throw unsupported(`the Field check cannot model copper shape "${shape.id}" with holes`);
		return flattenContour(g.region.outer, ROUND_CHORD_TOLERANCE_MM);
	}
	if (g.kind === 'circle') return flattenContour(createCircleContour(g.center, g.diameterMm / 2), ROUND_CHORD_TOLERANCE_MM);
	throw unsupported(`the Field check cannot model outline shape "${shape.id}" as copper`);
}

/** Metal edges of the copper outlines along one axis: axis-aligned extremes with copper on one side only. */
function metalEdges(layer: CopperLayerOutlines, axis: 0 | 1): MetalEdge[] {
	const outlines = layer.rings;
	const isMetal = (p: Point) => outlines.some((ring) => isPointInRing(p, ring));
	const snap = (v: number) => layer.extremes[axis].find((e) => Math.abs(e - v) <= 2 * ROUND_CHORD_TOLERANCE_MM) ?? v;
	const edges: MetalEdge[] = [];
	for (const ring of outlines) {
		for (let i = 0; i < ring.length; i++) {
			const a = ring[i];
			const b = ring[(i + 1) % ring.length];
			const along = axis === 0 ? 1 : 0;
			// an edge perpendicular to the axis: constant coordinate on `axis`, length along the other
			const isExtreme = ring.every((p) => p[axis] >= a[axis] - 1e-9) || ring.every((p) => p[axis] <= a[axis] + 1e-9);
			const straight = Math.abs(a[axis] - b[axis]) < 1e-9 && Math.abs(a[along] - b[along]) > 1e-6;
			if (!straight && !isExtreme) continue;
			const mid: Point = straight ? [(a[0] + b[0]) / 2, (a[1] + b[1]) / 2] : a;
			// a chorded extreme is tested a little further out and in, past the chords’ sagitta; edges snap to the exact extremes
			const eps = straight ? 1e-4 : 5 * ROUND_CHORD_TOLERANCE_MM;
			const plus: Point = axis === 0 ? [mid[0] + eps, mid[1]] : [mid[0], mid[1] + eps];
			const minus: Point = axis === 0 ? [mid[0] - eps, mid[1]] : [mid[0], mid[1] - eps];
			const up = isMetal(plus);
			const down = isMetal(minus);
			if (up !== down) edges.push({ positionMm: snap(mid[axis]), metalSide: up ? 1 : -1 });
		}
	}
	return edges;
}

interface TwoCopperStack {
	groundZMm: number;
	topZMm: number;
	dielectric: Extract<StackLayer, { kind: 'dielectric' }>;
	topCopper: Extract<StackLayer, { kind: 'copper' }>;
	bottomCopper: Extract<StackLayer, { kind: 'copper' }>;
}

function twoCopperStack(artwork: Artwork): TwoCopperStack {
	const coppers = artwork.stack.filter((l) => l.kind === 'copper');
	const dielectrics = artwork.stack.filter((l) => l.kind === 'dielectric');
	if (coppers.length !== 2 || dielectrics.length !== 1 || artwork.metadata.copperLayerCount !== 2) {
		throw unsupported('the Field check models a single patch on one dielectric between two coppers; layered feeds, stacks and arrays are not modelled yet');
	}
	const dielectric = dielectrics[0];
	const roles = artwork.layers.flatMap((l) => l.shapes.map((sh) => sh.role));
	if (roles.filter((r) => r === 'patch').length !== 1 || roles.some((r) => r === 'feed-network' || r === 'parasitic-patch' || r === 'coupling-slot')) {
		throw unsupported('the Field check models a single patch on one dielectric between two coppers; layered feeds, stacks and arrays are not modelled yet');
	}
	return { groundZMm: dielectric.zMm, topZMm: dielectric.zMm + dielectric.thicknessMm, dielectric, topCopper: coppers[0], bottomCopper: coppers[1] };
}

/**
 * Builds the engine model of a two-copper artwork (patch and feed on top, ground below). Copper is
 * a conducting sheet (its conductivity and thickness) on each face of the dielectric; the dielectric
 * spans the board; the feed is a lumped port of `referenceImpedanceOhm`: at the microstrip line's
 * start (the board edge), from the ground up to the line across its width, or at the probe's ground
 * end, one cell high, below a perfectly conducting wire on the probe's mesh line that runs up to
 * the patch (the drill's diameter and plating do not enter the model: the wire's effective radius is
 * the mesh's). The ground clearance of a probe is not modelled: the port stands in for the
 * connector's aperture. A connector launch's plated holes are perfectly
 * conducting posts from ground to top copper and its top ground pads are top copper; a back-side
 * ground pad lies on the ground and adds nothing; the connector body itself is not modelled.
 */
export function buildFieldModel(artwork: Artwork, referenceImpedanceOhm: number, options: FieldModelOptions): FieldModel {
	const refinement = options.refinement ?? 1;
	const { groundZMm, topZMm, dielectric, topCopper, bottomCopper } = twoCopperStack(artwork);
	const targetHz = artwork.metadata.frequencyHz;
	const lowHz = targetHz * (1 - CHECK_BAND_FRACTION);
	const highHz = targetHz * (1 + CHECK_BAND_FRACTION);
	const heightMm = dielectric.thicknessMm;

	const cellsPerWavelength = CELLS_PER_WAVELENGTH[options.mode] * refinement;
	const dielectricWavelengthMm = (SPEED_OF_LIGHT_M_PER_S * 1000) / (highHz * Math.sqrt(dielectric.relativePermittivity));
	const maxFineCellMm = dielectricWavelengthMm / cellsPerWavelength;
	const maxAirCellMm = freeSpaceWavelengthMm(highHz) / cellsPerWavelength;
	const edgeCellMm = maxFineCellMm * EDGE_CELL_FRACTION;
	const layerCells = Math.max(Math.ceil(MIN_CELLS_PER_LAYER[options.mode] * refinement), Math.ceil(heightMm / maxFineCellMm));
	const layerCellMm = heightMm / layerCells;
	const boundaryMm = freeSpaceWavelengthMm(targetHz) * BOUNDARY_DISTANCE_WAVELENGTHS;

	const topLayer = artwork.layers.find((l) => l.id === topCopper.layerId);
	const groundLayer = artwork.layers.find((l) => l.id === bottomCopper.layerId);
	if (!topLayer || !groundLayer) throw unsupported('the artwork lacks its copper layers');
	const topCopperOutlines = copperOutlines(topLayer.shapes);
	const groundCopperOutlines = copperOutlines(groundLayer.shapes);
	const topOutlines = topCopperOutlines.rings;
	const groundOutlines = groundCopperOutlines.rings;

	const sheet = (name: string, layer: typeof topCopper, outlines: Point[][], zMm: number): ModelProperty => ({
		kind: 'sheet',
		name,
		conductivitySPerM: layer.conductivitySPerM,
		thicknessMm: layer.thicknessMm,
		primitives: outlines.map((pts): ModelPrimitive => ({ kind: 'polygon', zMm, thicknessMm: 0, pointsMm: pts, priority: PRIORITY_COPPER }))
	});
	const { widthMm: boardW, lengthMm: boardL } = artwork.board;
	const properties: ModelProperty[] = [
		{
			kind: 'dielectric',
			name: 'substrate',
			relativePermittivity: dielectric.relativePermittivity,
			conductivitySPerM: conductivityForLossTangent(dielectric.relativePermittivity, dielectric.lossTangent, targetHz),
			primitives: [{ kind: 'box', fromMm: [0, 0, groundZMm], toMm: [boardW, boardL, topZMm], priority: PRIORITY_DIELECTRIC }]
		},
		sheet('copper-top', topCopper, topOutlines, topZMm),
		sheet('copper-ground', bottomCopper, groundOutlines, groundZMm)
	];

	const fixedX: number[] = [];
	const fixedY: number[] = [];
	const fixedZ: number[] = Array.from({ length: layerCells + 1 }, (_, k) => groundZMm + k * layerCellMm);
	let port: FieldModel['port'];
	const feedKind = artwork.metadata.feedKind;
	switch (feedKind) {
		case 'probe': {
			const drill = artwork.drills.find((d) => d.role === 'probe');
			if (!drill) throw unsupported('a probe feed needs its probe drill');
			const [px, py] = drill.center;
			const portTopZ = groundZMm + layerCellMm;
			// the pin is a conducting wire on the probe's mesh line (the engine's own probe-fed patch feeds a line too:
			// openEMS 0.0.35, Tutorials/Simple_Patch_Antenna.m). A cylinder of the drill's radius put a cross of conducting
			// edges at its foot, one cell above the ground, wherever mesh lines lay within its diameter: a capacitor across
			// the port that grew as the mesh was refined (R8 of the Accuracy table: resistance peak 1.3 % lower at 77 Ω
			// instead of 35 Ω on the standard mesh, 3.3 % lower at 210 Ω on the 1.5× refined one; absent on coarser meshes).
			properties.push({ kind: 'pec', name: 'probe-pin', primitives: [{ kind: 'box', fromMm: [px, py, portTopZ], toMm: [px, py, topZMm], priority: PRIORITY_PIN }] });
			port = { fromMm: [px, py, groundZMm], toMm: [px, py, portTopZ], referenceImpedanceOhm };
			fixedX.push(px);
			fixedY.push(py);
			break;
		}
		case 'inset':
		case 'edge':
		case 'quarter-wave': {
			const line = topLayer.shapes.find((s) => s.role === 'feed-line');
			if (!line) throw unsupported('a microstrip feed needs its feed line');
			const pts = shapeOutline(line);
			const x0 = pts.reduce((m, p) => Math.min(m, p[0]), Infinity);
			const x1 = pts.reduce((m, p) => Math.max(m, p[0]), -Infinity);
			// one thirds-rule cell in from the board edge, so the port sits on copper at both ends
			const y0 = pts.reduce((m, p) => Math.min(m, p[1]), Infinity) + edgeCellMm;
			port = { fromMm: [x0, y0, groundZMm], toMm: [x1, y0, topZMm], referenceImpedanceOhm };
			fixedY.push(y0);
			break;
		}
		case 'aperture-coupled':
		case 'proximity-coupled':
			throw unsupported(`the Field check does not model a ${feedKind} feed yet`);
		default:
			return feedKind satisfies never;
	}

	// the connector launch's plated holes (edge-launch vias, back-side flange holes): perfectly conducting posts from
	// the ground up to the top copper, each on a mesh line in x and y; its top ground pads are already top copper
	const launchHoles = artwork.drills.filter((d) => d.role === 'launch-via' || d.role === 'launch-flange');
	if (launchHoles.length > 0) {
		properties.push({
			kind: 'pec',
			name: 'launch-holes',
			primitives: launchHoles.map((d): ModelPrimitive => ({ kind: 'cylinder', centerMm: d.center, fromZMm: groundZMm, toZMm: topZMm, radiusMm: d.diameterMm / 2, priority: PRIORITY_PIN }))
		});
		for (const d of launchHoles) {
			if (!fixedX.some((v) => Math.abs(v - d.center[0]) < 1e-9)) fixedX.push(d.center[0]);
			if (!fixedY.some((v) => Math.abs(v - d.center[1]) < 1e-9)) fixedY.push(d.center[1]);
		}
	}

	// edges lying on or beside a fixed line are resolved by it (the port plane near the board edge)
	const awayFrom = (fixed: number[]) => (e: MetalEdge) => fixed.every((f) => Math.abs(f - e.positionMm) > edgeCellMm * 1.01);
	// each copper layer's edges on its own: the ground under the patch does not hide the patch's edges
	const edgesOf = (axis: 0 | 1) => [...metalEdges(topCopperOutlines, axis), ...metalEdges(groundCopperOutlines, axis)];
	const planXY: AxisPlan = { maxFineCellMm, maxAirCellMm, edgeCellMm };
	const planZ: AxisPlan = { maxFineCellMm: layerCellMm, maxAirCellMm, edgeCellMm: layerCellMm };
	const x: AxisFeatures = { fromMm: -boundaryMm, toMm: boardW + boundaryMm, edges: edgesOf(0).filter(awayFrom(fixedX)), fixedMm: fixedX, fineFromMm: 0, fineToMm: boardW };
	const y: AxisFeatures = { fromMm: -boundaryMm, toMm: boardL + boundaryMm, edges: edgesOf(1).filter(awayFrom(fixedY)), fixedMm: fixedY, fineFromMm: 0, fineToMm: boardL };
	const z: AxisFeatures = { fromMm: groundZMm - boundaryMm, toMm: topZMm + boundaryMm, edges: [], fixedMm: fixedZ, fineFromMm: groundZMm, fineToMm: topZMm };
	const mesh = buildMesh({ x, y, z }, { x: planXY, y: planXY, z: planZ });

	const nearFarField = options.nearFarField ?? true;
	return {
		mode: options.mode,
		refinement,
		targetFrequencyHz: targetHz,
		band: { lowHz, highHz },
		excitation: { centerHz: targetHz, cutoffHz: targetHz * CHECK_BAND_FRACTION },
		lossReferenceHz: targetHz,
		boundary: 'MUR',
		endCriterionDb: END_CRITERION_DB,
		maxTimesteps: MAX_TIMESTEPS,
		mesh,
		properties,
		port,
		nearFieldBox: nearFarField ? nearFieldBoxOf(mesh, boardW, boardL, groundZMm, topZMm, targetHz) : null
	};
}

/** A box halfway between the board and the boundaries, snapped to mesh lines, for the far-field transform. */
function nearFieldBoxOf(mesh: FieldModel['mesh'], boardW: number, boardL: number, groundZMm: number, topZMm: number, targetHz: number): FieldModel['nearFieldBox'] {
	const snap = (lines: readonly number[], want: number) => lines.reduce((best, l) => (Math.abs(l - want) < Math.abs(best - want) ? l : best), lines[0]);
	const mid = (lines: readonly number[], inner: number, side: -1 | 1) => snap(lines, (inner + (side < 0 ? lines[0] : lines[lines.length - 1])) / 2);
	return {
		fromMm: [mid(mesh.xMm, 0, -1), mid(mesh.yMm, 0, -1), mid(mesh.zMm, groundZMm, -1)],
		toMm: [mid(mesh.xMm, boardW, 1), mid(mesh.yMm, boardL, 1), mid(mesh.zMm, topZMm, 1)],
		frequenciesHz: [targetHz]
	};
}
