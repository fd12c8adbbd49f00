// A Gerber file's text → its file function and image items, replayed from the @tracespace/parser syntax tree.
import { createParser, type Root } from '@tracespace/parser';
import { createCircleContour, flattenContour, contourBounds, mergeBounds, CHORD_TOLERANCE_MM, type Bounds, type Contour, type Point, type Segment } from '../../geometry';
import type { FabStroke } from './fab-view';
import type { ImageItem } from './image-item';
import { lengthInMm, parseCoordinateMm, type NumberFormat } from './parse-coordinate';

export interface ReadGerber {
	/** Values of %TF.FileFunction, e.g. ["Copper", "L1", "Top"]; null when absent. */
	readonly fileFunction: string[] | null;
	readonly items: ImageItem[];
	/** Centre lines of strokes (the profile's outline), for extents. */
	readonly strokeBounds: Bounds | null;
	/** Every stroke drawn with a round aperture, in file order: its centre line (arcs flattened), pen width and polarity. */
	readonly strokes: FabStroke[];
	/** Why the file cannot be trusted, if it cannot. */
	readonly problems: { readonly kind: 'file-unreadable' | 'file-unsupported'; readonly message: string }[];
}

/** Attribute commands we write and the parser leaves unimplemented; anything else unknown is refused. */
const KNOWN_UNIMPLEMENTED = /^%T[FAOD]/;

export function parseGerberTree(text: string): Root {
	const parser = createParser();
	parser.feed(text);
	return parser.results();
}

/** Closed contour from a region's segments in mm. */
function toContour(start: Point, segments: Segment[]): Contour {
	return { start, segments };
}

/** A round pen dragged along a polyline: the union of a rectangle per chord and a disc per vertex. */
export function strokeItems(points: readonly Point[], widthMm: number, polarity: 'dark' | 'clear'): ImageItem[] {
	const r = widthMm / 2;
	const items: ImageItem[] = points.map((p) => ({ polarity, rings: [flattenContour(createCircleContour(p, r), CHORD_TOLERANCE_MM)] }));
	for (let i = 0; i + 1 < points.length; i++) {
		const [a, b] = [points[i], points[i + 1]];
		const len = Math.hypot(b[0] - a[0], b[1] - a[1]);
		if (len === 0) continue;
		const nx = (-(b[1] - a[1]) / len) * r;
		const ny = ((b[0] - a[0]) / len) * r;
		items.push({ polarity, rings: [[[a[0] + nx, a[1] + ny], [a[0] - nx, a[1] - ny], [b[0] - nx, b[1] - ny], [b[0] + nx, b[1] + ny]]] });
	}
	return items;
}

export function readGerber(text: string): ReadGerber {
	const tree = parseGerberTree(text);
	const problems: ReadGerber['problems'] = [];
	if (tree.filetype !== 'gerber') problems.push({ kind: 'file-unreadable', message: 'not recognised as a Gerber file' });
	if (!tree.done) problems.push({ kind: 'file-unreadable', message: 'no end-of-file (M02): the file is cut short or broken' });

	let nf: NumberFormat = { format: null, zeroSuppression: null, units: 'mm' };
	let fileFunction: string[] | null = null;
	let polarity: 'dark' | 'clear' = 'dark';
	let mode: 'line' | 'cw' | 'ccw' | null = null;
	let inRegion = false;
	let current: Point = [0, 0];
	let tool: string | null = null;
	const tools = new Map<string, number>(); // code → diameter in file units
	const items: ImageItem[] = [];
	let strokeBounds: Bounds | null = null;
	const strokes: FabStroke[] = [];
	let regionStart: Point | null = null;
	let regionSegments: Segment[] = [];
	let strokeStart: Point | null = null;
	let strokeSegments: Segment[] = [];
	const unsupported = (message: string) => problems.push({ kind: 'file-unsupported', message });

	const closeRegion = () => {
		if (regionStart && regionSegments.length) items.push({ polarity, rings: [flattenContour(toContour(regionStart, regionSegments), CHORD_TOLERANCE_MM)] });
		regionStart = null;
		regionSegments = [];
	};
	const closeStroke = () => {
		if (strokeStart && strokeSegments.length) {
			const path = toContour(strokeStart, strokeSegments);
			strokeBounds = strokeBounds ? mergeBounds(strokeBounds, contourBounds(path)) : contourBounds(path);
			const d = tool ? tools.get(tool) : undefined;
			if (d === undefined) unsupported('a stroke without a round aperture');
			else {
				// a closing line back to the start makes the path a contour; flattenContour drops exactly that line's end
				const pts = flattenContour({ start: strokeStart, segments: [...strokeSegments, { kind: 'line', to: strokeStart }] }, CHORD_TOLERANCE_MM);
				for (const item of strokeItems(pts, lengthInMm(d, nf.units), polarity)) items.push(item);
				strokes.push({ points: pts.map(([x, y]): [number, number] => [x, y]), widthMm: lengthInMm(d, nf.units), polarity });
			}
		}
		strokeStart = null;
		strokeSegments = [];
	};

	for (const node of tree.children) {
		switch (node.type) {
			case 'unimplemented':
				if (node.value.startsWith('%TF.FileFunction,')) fileFunction = node.value.slice('%TF.FileFunction,'.length).replace(/\*%$/, '').split(',');
				else if (!KNOWN_UNIMPLEMENTED.test(node.value)) unsupported(`command not read: ${node.value.slice(0, 40)}`);
				break;
			case 'coordinateFormat':
				if (node.mode === 'incremental') unsupported('incremental coordinates');
				nf = { ...nf, format: node.format, zeroSuppression: node.zeroSuppression };
				break;
			case 'units':
				nf = { ...nf, units: node.units };
				break;
			case 'toolDefinition':
				if (node.shape.type !== 'circle' || node.hole) unsupported(`aperture D${node.code} is not a plain circle`);
				else tools.set(node.code, node.shape.diameter);
				break;
			case 'toolMacro':
				unsupported(`aperture macro ${node.name}`);
				break;
			case 'stepRepeat':
				unsupported('step and repeat');
				break;
			case 'quadrantMode':
				if (node.quadrant !== 'multi') unsupported('single-quadrant arcs');
				break;
			case 'toolChange':
				closeStroke();
				tool = node.code;
				break;
			case 'loadPolarity':
				closeStroke();
				polarity = node.polarity;
				break;
			case 'interpolateMode':
				mode = node.mode === 'cwArc' ? 'cw' : node.mode === 'ccwArc' ? 'ccw' : node.mode === 'line' ? 'line' : mode;
				break;
			case 'regionMode':
				closeStroke();
				if (!node.region) closeRegion();
				inRegion = node.region;
				break;
			case 'graphic': {
				const c = node.coordinates;
				const to: Point = [c.x === undefined ? current[0] : parseCoordinateMm(c.x, nf), c.y === undefined ? current[1] : parseCoordinateMm(c.y, nf)];
				if (node.graphic === 'move') {
					if (inRegion) closeRegion();
					else closeStroke();
				} else if (node.graphic === 'segment') {
					if (mode === null) unsupported('a draw before any interpolation mode');
					const seg: Segment =
						mode === 'cw' || mode === 'ccw'
							? { kind: 'arc', to, center: [current[0] + parseCoordinateMm(c.i ?? '0', nf), current[1] + parseCoordinateMm(c.j ?? '0', nf)], clockwise: mode === 'cw' }
							: { kind: 'line', to };
					if (inRegion) {
						regionStart ??= current;
						regionSegments.push(seg);
					} else {
						strokeStart ??= current;
						strokeSegments.push(seg);
					}
				} else if (node.graphic === 'shape') {
					closeStroke();
					const d = tool ? tools.get(tool) : undefined;
					if (d === undefined) unsupported('a flash without a round aperture');
					else items.push({ polarity, rings: [flattenContour(createCircleContour(to, lengthInMm(d, nf.units) / 2), CHORD_TOLERANCE_MM)] });
				} else {
					unsupported(`graphic "${String(node.graphic)}" without an explicit D01/D02/D03`);
				}
				current = to;
				break;
			}
		}
	}
	closeStroke();
	return { fileFunction, items, strokeBounds, strokes, problems };
}
