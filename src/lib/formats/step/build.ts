// Artwork → STEP entities: every dielectric and copper as faceted prisms (planar B-rep), drills cut as polygonal holes, probe barrel or pin as its own body.
import type { Artwork, ArtworkDrill, ArtworkShape, StackLayer } from '../../artwork';
import {
	contourArea,
	createCircleContour,
	createPolygonContour,
	createRectangleContour,
	differenceRegions,
	flattenContour,
	unionRegions,
	type Point,
	type Region
} from '../../geometry';
import { SOFTWARE_NAME, type ExportMeta } from '../export-meta';
import { bool, derived, enumValue, int, list, real, ref, str, typed, unset, type StepDocument, type StepEntity, type StepRecord, type StepValue } from './commands';

/**
 * Largest gap between a true arc and the chords that stand for it in the STEP file: 0.5 µm keeps
 * every round shape's extents within the 1 µm the tests check and a drill's area within 0.01 %.
 */
export const STEP_CHORD_TOLERANCE_MM = 0.0005;

/** What a body is made of: picks its colour. */
export type StepMaterial = 'copper' | 'core' | 'bonding' | 'probe';

/** Our own colours per material (RGB 0–1): warm copper, a sage laminate, a pale bonding film, a bright probe metal. */
export const STEP_COLOURS: Readonly<Record<StepMaterial, readonly [number, number, number]>> = {
	copper: [0.86, 0.5, 0.27],
	core: [0.42, 0.56, 0.4],
	bonding: [0.86, 0.83, 0.62],
	probe: [0.93, 0.77, 0.36]
};

/** A straight-sided area: outer ring counter-clockwise, holes clockwise, no ring repeating its first point. */
export interface StepFace {
	readonly outer: readonly Point[];
	readonly holes: readonly (readonly Point[])[];
}

/** One named solid: a face extruded from zMm to zMm + thicknessMm. */
export interface StepBody {
	readonly name: string;
	readonly material: StepMaterial;
	readonly face: StepFace;
	readonly zMm: number;
	readonly thicknessMm: number;
}

const ringOf = (points: readonly Point[], counterClockwise: boolean): Point[] => {
	const ring = dropRepeats(points);
	const area = contourArea(createPolygonContour(ring));
	return (area > 0) === counterClockwise ? ring : [...ring].reverse();
};

function dropRepeats(points: readonly Point[]): Point[] {
	const out: Point[] = [];
	for (const p of points) {
		const last = out[out.length - 1];
		if (!last || Math.abs(last[0] - p[0]) > 1e-9 || Math.abs(last[1] - p[1]) > 1e-9) out.push(p);
	}
	while (out.length > 1 && Math.abs(out[0][0] - out[out.length - 1][0]) <= 1e-9 && Math.abs(out[0][1] - out[out.length - 1][1]) <= 1e-9) out.pop();
	return out;
}

const polygonRegion = (points: readonly Point[]): Region => ({ outer: createPolygonContour(points), holes: [] });
const circleRegion = (center: Point, diameterMm: number): Region => polygonRegion(flattenContour(createCircleContour(center, diameterMm / 2), STEP_CHORD_TOLERANCE_MM));

/** A shape's filled area as straight regions (an outline, such as the profile, fills nothing). */
function shapeRegions(shape: ArtworkShape): Region[] {
	const g = shape.geometry;
	if (g.kind === 'circle') return [circleRegion(g.center, g.diameterMm)];
	if (g.kind === 'outline' || g.kind === 'stroke') return [];
	const flat = (c: typeof g.region.outer) => createPolygonContour(flattenContour(c, STEP_CHORD_TOLERANCE_MM));
	return [{ outer: flat(g.region.outer), holes: g.region.holes.map(flat) }];
}

/** The diameter the fab drills: the finished hole plus the barrel wall on both sides when the probe is a plated barrel. */
export function drilledDiameterMm(artwork: Artwork, drill: ArtworkDrill): number {
	const probe = artwork.metadata.probe;
	if (drill.role === 'probe' && drill.plated && probe?.model === 'plated-barrel' && probe.platingThicknessUm !== null) {
		return drill.diameterMm + (2 * probe.platingThicknessUm) / 1000;
	}
	return drill.diameterMm;
}

const toFaces = (regions: readonly Region[]): StepFace[] =>
	regions
		.map((r) => ({ outer: ringOf(flattenContour(r.outer), true), holes: r.holes.map((h) => ringOf(flattenContour(h), false)) }))
		.filter((f) => f.outer.length >= 3 && Math.abs(contourArea(createPolygonContour(f.outer))) > 1e-9)
		.map((f) => ({ ...f, holes: f.holes.filter((h) => h.length >= 3) }))
		.sort((a, b) => a.outer[0][1] - b.outer[0][1] || a.outer[0][0] - b.outer[0][0]);

/** Copper index above (k) and below (k + 1) each dielectric; copper k for a copper slab. */
function copperIndexes(stack: readonly StackLayer[]): number[] {
	let copper = 0;
	return stack.map((s) => (s.kind === 'copper' ? ++copper : copper));
}

const formatEr = (er: number) => String(Number(er.toFixed(3)));

/** The solids of the board, top to bottom, then the probe bodies. */
export function buildStepBodies(artwork: Artwork): StepBody[] {
	const indexes = copperIndexes(artwork.stack);
	const holesThrough = (passes: (d: ArtworkDrill) => boolean) => artwork.drills.filter(passes).map((d) => circleRegion(d.center, drilledDiameterMm(artwork, d)));
	const bodies: StepBody[] = [];
	const named = (base: string, faces: StepFace[]) => faces.map((face, i) => ({ name: faces.length > 1 ? `${base} part ${i + 1}` : base, face }));
	let core = 0, bonding = 0;
	artwork.stack.forEach((slab, i) => {
		const k = indexes[i];
		if (slab.kind === 'copper') {
			const layer = artwork.layers.find((l) => l.id === slab.layerId);
			if (!layer) return;
			let copper: Region[] = [];
			for (const shape of layer.shapes) {
				const regions = shapeRegions(shape);
				if (regions.length === 0) continue;
				copper = shape.polarity === 'dark' ? unionRegions(copper, regions) : differenceRegions(copper, regions);
			}
			const holes = holesThrough((d) => d.fromCopper <= k && d.toCopper >= k);
			if (holes.length && copper.length) copper = differenceRegions(copper, holes);
			for (const b of named(`L${k} ${layer.title}`, toFaces(copper))) bodies.push({ ...b, material: 'copper', zMm: slab.zMm, thicknessMm: slab.thicknessMm });
			return;
		}
		const board = [polygonRegion(flattenContour(createRectangleContour(0, 0, artwork.board.widthMm, artwork.board.lengthMm)))];
		const holes = holesThrough((d) => d.fromCopper <= k && d.toCopper >= k + 1);
		const faces = toFaces(holes.length ? differenceRegions(board, holes) : board);
		const base = slab.bonding ? `bonding film ${++bonding}` : slab.id === 'substrate' ? 'substrate' : `core ${++core}`;
		for (const b of named(`${base} (\u03b5r ${formatEr(slab.relativePermittivity)})`, faces)) bodies.push({ ...b, material: slab.bonding ? 'bonding' : 'core', zMm: slab.zMm, thicknessMm: slab.thicknessMm });
	});
	const probe = artwork.metadata.probe;
	for (const d of artwork.drills) {
		if (d.role !== 'probe' || !probe) continue;
		const z = spanZ(artwork.stack, indexes, d);
		if (!z) continue;
		const ring = (diameterMm: number, ccw: boolean) => ringOf(flattenContour(createCircleContour(d.center, diameterMm / 2), STEP_CHORD_TOLERANCE_MM), ccw);
		if (probe.model === 'plated-barrel' && probe.platingThicknessUm !== null) {
			const face = { outer: ring(drilledDiameterMm(artwork, d), true), holes: [ring(d.diameterMm, false)] };
			bodies.push({ name: `${d.id} barrel (plated, ${probe.platingThicknessUm} \u00b5m wall)`, material: 'probe', face, zMm: z.zMm, thicknessMm: z.thicknessMm });
		} else if (probe.model === 'solid-pin') {
			bodies.push({ name: `${d.id} pin (solid, \u00d8 ${d.diameterMm.toFixed(3)} mm)`, material: 'probe', face: { outer: ring(d.diameterMm, true), holes: [] }, zMm: z.zMm, thicknessMm: z.thicknessMm });
		}
	}
	return bodies;
}

/** From the bottom face of copper `toCopper` to the top face of copper `fromCopper`. */
function spanZ(stack: readonly StackLayer[], indexes: readonly number[], d: ArtworkDrill): { zMm: number; thicknessMm: number } | undefined {
	const top = stack.find((s, i) => s.kind === 'copper' && indexes[i] === d.fromCopper);
	const bottom = stack.find((s, i) => s.kind === 'copper' && indexes[i] === d.toCopper);
	if (!top || !bottom) return undefined;
	return { zMm: bottom.zMm, thicknessMm: top.zMm + top.thicknessMm - bottom.zMm };
}

/** What the file's header comments say about holes, in every file alike. */
export const STEP_HOLE_NOTE = [
	'Faceted model: every face is planar; round edges (drills, round patches, pads) are chords within 0.5 um of the true arc.',
	'Drilled holes are cut through every dielectric and copper the drill spans, at the drilled diameter',
	'(finished hole + 2 x plating for a plated-barrel probe). A plated barrel is its own body filling that wall;',
	'a solid pin is its own body filling the finished hole; with no stated probe model the hole is left empty.',
	'Not modelled: solder mask, silkscreen, surface finish, connectors, the board profile tool path.'
];

/** The board as STEP entities in the AP214 AUTOMOTIVE_DESIGN schema, millimetres. */
export function buildStepDocument(artwork: Artwork, meta: ExportMeta, fileName: string): StepDocument {
	const entities: StepEntity[] = [];
	let next = 1;
	const add = (name: string, ...values: StepValue[]): number => {
		const id = next++;
		entities.push({ type: 'simple', id, record: { name, values } });
		return id;
	};
	const addComplex = (...records: StepRecord[]): number => {
		const id = next++;
		entities.push({ type: 'complex', id, records });
		return id;
	};
	const rec = (name: string, ...values: StepValue[]): StepRecord => ({ name, values });
	const reals = (...v: number[]) => list(v.map(real));

	// product structure (ISO 10303-214 / AP214 entity names)
	const appContext = add('APPLICATION_CONTEXT', str('automotive design'));
	add('APPLICATION_PROTOCOL_DEFINITION', str('international standard'), str('automotive_design'), int(2000), ref(appContext));
	const productContext = add('PRODUCT_CONTEXT', str(''), ref(appContext), str('mechanical'));
	const title = `${meta.designName} revision ${meta.revisionLabel}`;
	const product = add('PRODUCT', str(`${meta.designSlug}-${meta.revisionLabel}`), str(title), str(`${SOFTWARE_NAME} board`), list([ref(productContext)]));
	add('PRODUCT_RELATED_PRODUCT_CATEGORY', str('part'), unset, list([ref(product)]));
	const formation = add('PRODUCT_DEFINITION_FORMATION', str(meta.revisionLabel), str(''), ref(product));
	const defContext = add('PRODUCT_DEFINITION_CONTEXT', str('part definition'), ref(appContext), str('design'));
	const definition = add('PRODUCT_DEFINITION', str('design'), str(''), ref(formation), ref(defContext));
	const definitionShape = add('PRODUCT_DEFINITION_SHAPE', str(''), str(''), ref(definition));

	// units: millimetre, radian, steradian; 1e-7 mm uncertainty
	const mm = addComplex(rec('LENGTH_UNIT'), rec('NAMED_UNIT', derived), rec('SI_UNIT', enumValue('MILLI'), enumValue('METRE')));
	const rad = addComplex(rec('NAMED_UNIT', derived), rec('PLANE_ANGLE_UNIT'), rec('SI_UNIT', unset, enumValue('RADIAN')));
	const sr = addComplex(rec('NAMED_UNIT', derived), rec('SI_UNIT', unset, enumValue('STERADIAN')), rec('SOLID_ANGLE_UNIT'));
	const uncertainty = add('UNCERTAINTY_MEASURE_WITH_UNIT', typed('LENGTH_MEASURE', real(1e-7)), ref(mm), str('distance_accuracy_value'), str('confusion accuracy'));
	const context = addComplex(
		rec('GEOMETRIC_REPRESENTATION_CONTEXT', int(3)),
		rec('GLOBAL_UNCERTAINTY_ASSIGNED_CONTEXT', list([ref(uncertainty)])),
		rec('GLOBAL_UNIT_ASSIGNED_CONTEXT', list([ref(mm), ref(rad), ref(sr)])),
		rec('REPRESENTATION_CONTEXT', str('board'), str('3D'))
	);

	const point = (x: number, y: number, z: number) => add('CARTESIAN_POINT', str(''), reals(x, y, z));
	const direction = (x: number, y: number, z: number) => add('DIRECTION', str(''), reals(x, y, z));
	const zUp = direction(0, 0, 1);
	const xRight = direction(1, 0, 0);
	const origin = add('AXIS2_PLACEMENT_3D', str(''), ref(point(0, 0, 0)), ref(zUp), ref(xRight));

	const bodies = buildStepBodies(artwork);
	const solids: { id: number; material: StepMaterial }[] = [];
	for (const body of bodies) solids.push({ id: prism(body), material: body.material });

	// the board is an assembly; each body is a part of its own so readers keep its name (NEXT_ASSEMBLY_USAGE_OCCURRENCE)
	const boardRep = add('SHAPE_REPRESENTATION', str(title), list([ref(origin)]), ref(context));
	add('SHAPE_DEFINITION_REPRESENTATION', ref(definitionShape), ref(boardRep));
	bodies.forEach((body, i) => {
		const part = add('PRODUCT', str(`${meta.designSlug}-${meta.revisionLabel}-body-${i + 1}`), str(body.name), str(''), list([ref(productContext)]));
		add('PRODUCT_RELATED_PRODUCT_CATEGORY', str('part'), unset, list([ref(part)]));
		const partFormation = add('PRODUCT_DEFINITION_FORMATION', str(meta.revisionLabel), str(''), ref(part));
		const partDefinition = add('PRODUCT_DEFINITION', str('design'), str(''), ref(partFormation), ref(defContext));
		const partShape = add('PRODUCT_DEFINITION_SHAPE', str(''), str(''), ref(partDefinition));
		const partOrigin = add('AXIS2_PLACEMENT_3D', str(''), ref(point(0, 0, 0)), ref(zUp), ref(xRight));
		const partRep = add('ADVANCED_BREP_SHAPE_REPRESENTATION', str(body.name), list([ref(partOrigin), ref(solids[i].id)]), ref(context));
		add('SHAPE_DEFINITION_REPRESENTATION', ref(partShape), ref(partRep));
		const usage = add('NEXT_ASSEMBLY_USAGE_OCCURRENCE', str(`body-${i + 1}`), str(body.name), str(''), ref(definition), ref(partDefinition), unset);
		const usageShape = add('PRODUCT_DEFINITION_SHAPE', str(''), str(''), ref(usage));
		const placement = add('ITEM_DEFINED_TRANSFORMATION', str(''), str(''), ref(partOrigin), ref(origin));
		const relation = addComplex(
			rec('REPRESENTATION_RELATIONSHIP', str(''), str(''), ref(partRep), ref(boardRep)),
			rec('REPRESENTATION_RELATIONSHIP_WITH_TRANSFORMATION', ref(placement)),
			rec('SHAPE_REPRESENTATION_RELATIONSHIP')
		);
		add('CONTEXT_DEPENDENT_SHAPE_REPRESENTATION', ref(relation), ref(usageShape));
	});

	// colours per material (PRESENTATION_STYLE_ASSIGNMENT / STYLED_ITEM with COLOUR_RGB)
	const styleOf = new Map<StepMaterial, number>();
	for (const material of Object.keys(STEP_COLOURS) as StepMaterial[]) {
		if (!solids.some((s) => s.material === material)) continue;
		const [r, g, b] = STEP_COLOURS[material];
		const colour = add('COLOUR_RGB', str(material), real(r), real(g), real(b));
		const fillColour = add('FILL_AREA_STYLE_COLOUR', str(''), ref(colour));
		const fill = add('FILL_AREA_STYLE', str(''), list([ref(fillColour)]));
		const surfaceFill = add('SURFACE_STYLE_FILL_AREA', ref(fill));
		const side = add('SURFACE_SIDE_STYLE', str(''), list([ref(surfaceFill)]));
		const usage = add('SURFACE_STYLE_USAGE', enumValue('BOTH'), ref(side));
		styleOf.set(material, add('PRESENTATION_STYLE_ASSIGNMENT', list([ref(usage)])));
	}
	const styled = solids.map((s) => add('STYLED_ITEM', str('colour'), list([ref(styleOf.get(s.material)!)]), ref(s.id)));
	add('MECHANICAL_DESIGN_GEOMETRIC_PRESENTATION_REPRESENTATION', str(''), list(styled.map(ref)), ref(context));

	return {
		header: {
			description: [`${SOFTWARE_NAME} 3-D board model of ${title}`],
			fileName,
			timeStamp: `${meta.revisionDate}T00:00:00`,
			author: SOFTWARE_NAME,
			organization: '',
			preprocessorVersion: `${SOFTWARE_NAME} ${meta.softwareVersion}`,
			originatingSystem: `${SOFTWARE_NAME} ${meta.softwareVersion}`,
			schema: 'AUTOMOTIVE_DESIGN { 1 0 10303 214 1 1 1 1 }',
			comments: [`${SOFTWARE_NAME} ${meta.softwareVersion}: ${bodies.length} bodies, units mm, z = 0 at the bottom face of the lowest copper.`, ...STEP_HOLE_NOTE]
		},
		entities
	};

	/** A face extruded along +z as a MANIFOLD_SOLID_BREP: bottom, top and one planar side per edge, edges shared in opposite senses. */
	function prism(body: StepBody): number {
		const z0 = body.zMm, z1 = body.zMm + body.thicknessMm;
		const faces: number[] = [];
		const rings = [body.face.outer, ...body.face.holes];
		const ringEdges = rings.map((ring) => {
			const n = ring.length;
			const bottomV = ring.map(([x, y]) => add('VERTEX_POINT', str(''), ref(point(x, y, z0))));
			const topV = ring.map(([x, y]) => add('VERTEX_POINT', str(''), ref(point(x, y, z1))));
			const line = (from: Point, to: Point, z: number) => {
				const length = Math.hypot(to[0] - from[0], to[1] - from[1]);
				const dir = direction((to[0] - from[0]) / length, (to[1] - from[1]) / length, 0);
				return add('LINE', str(''), ref(point(from[0], from[1], z)), ref(add('VECTOR', str(''), ref(dir), real(length))));
			};
			const bottom = ring.map((p, i) => add('EDGE_CURVE', str(''), ref(bottomV[i]), ref(bottomV[(i + 1) % n]), ref(line(p, ring[(i + 1) % n], z0)), bool(true)));
			const top = ring.map((p, i) => add('EDGE_CURVE', str(''), ref(topV[i]), ref(topV[(i + 1) % n]), ref(line(p, ring[(i + 1) % n], z1)), bool(true)));
			const vertical = ring.map(([x, y], i) => {
				const l = add('LINE', str(''), ref(point(x, y, z0)), ref(add('VECTOR', str(''), ref(zUp), real(z1 - z0))));
				return add('EDGE_CURVE', str(''), ref(bottomV[i]), ref(topV[i]), ref(l), bool(true));
			});
			return { ring, bottom, top, vertical };
		});
		const oriented = (edge: number, forward: boolean) => add('ORIENTED_EDGE', str(''), derived, derived, ref(edge), bool(forward));
		const loop = (edges: number[]) => add('EDGE_LOOP', str(''), list(edges.map(ref)));
		const bound = (l: number, outer: boolean) => add(outer ? 'FACE_OUTER_BOUND' : 'FACE_BOUND', str(''), ref(l), bool(true));
		const plane = (at: number, axis: number, refDir: number) => add('PLANE', str(''), ref(add('AXIS2_PLACEMENT_3D', str(''), ref(at), ref(axis), ref(refDir))));
		// bottom face: outward normal −z, so each ring is walked backwards
		const bottomBounds = ringEdges.map((r, k) => bound(loop([...r.bottom].reverse().map((e) => oriented(e, false))), k === 0));
		faces.push(add('ADVANCED_FACE', str(''), list(bottomBounds.map(ref)), ref(plane(point(0, 0, z0), zUp, xRight)), bool(false)));
		const topBounds = ringEdges.map((r, k) => bound(loop(r.top.map((e) => oriented(e, true))), k === 0));
		faces.push(add('ADVANCED_FACE', str(''), list(topBounds.map(ref)), ref(plane(point(0, 0, z1), zUp, xRight)), bool(true)));
		// sides: material lies left of each ring's direction, so the outward normal is the right-hand side (dy, −dx)
		for (const { ring, bottom, top, vertical } of ringEdges) {
			const n = ring.length;
			ring.forEach((a, i) => {
				const j = (i + 1) % n;
				const b = ring[j];
				const length = Math.hypot(b[0] - a[0], b[1] - a[1]);
				const dx = (b[0] - a[0]) / length, dy = (b[1] - a[1]) / length;
				const l = loop([oriented(bottom[i], true), oriented(vertical[j], true), oriented(top[i], false), oriented(vertical[i], false)]);
				const p = plane(point(a[0], a[1], z0), direction(dy, -dx, 0), direction(dx, dy, 0));
				faces.push(add('ADVANCED_FACE', str(''), list([ref(bound(l, true))]), ref(p), bool(true)));
			});
		}
		const shell = add('CLOSED_SHELL', str(''), list(faces.map(ref)));
		return add('MANIFOLD_SOLID_BREP', str(body.name), ref(shell));
	}
}
