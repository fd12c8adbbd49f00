// Test helper: replays a @tracespace/parser syntax tree into regions, flashes and strokes in mm.
import { createParser, type Root } from '@tracespace/parser';

export interface ReadSegment {
	kind: 'line' | 'cw' | 'ccw';
	from: [number, number];
	to: [number, number];
	center?: [number, number];
}
export interface ReadRegion {
	polarity: 'dark' | 'clear';
	contour: ReadSegment[];
}
export interface ReadFlash {
	polarity: 'dark' | 'clear';
	at: [number, number];
	diameterMm: number;
}
export interface ReadBack {
	tree: Root;
	regions: ReadRegion[];
	flashes: ReadFlash[];
	strokes: ReadSegment[];
	fileAttributes: string[];
}

export function parseGerber(text: string): Root {
	const parser = createParser();
	parser.feed(text);
	return parser.results();
}

export function readBackGerber(text: string): ReadBack {
	const tree = parseGerber(text);
	let decimals = 6;
	let polarity: 'dark' | 'clear' = 'dark';
	let mode: 'line' | 'cw' | 'ccw' = 'line';
	let inRegion = false;
	let current: [number, number] = [0, 0];
	let tool = '';
	const tools = new Map<string, number>();
	const regions: ReadRegion[] = [];
	const flashes: ReadFlash[] = [];
	const strokes: ReadSegment[] = [];
	const fileAttributes: string[] = [];
	let contour: ReadSegment[] = [];
	const num = (s: string | undefined, fallback: number) => (s === undefined ? fallback : Number(s) / 10 ** decimals);
	const closeContour = () => {
		if (contour.length) regions.push({ polarity, contour });
		contour = [];
	};
	for (const node of tree.children) {
		switch (node.type) {
			case 'unimplemented':
				if (node.value.startsWith('%TF.')) fileAttributes.push(node.value);
				break;
			case 'coordinateFormat':
				if (node.format) decimals = node.format[1];
				break;
			case 'toolDefinition':
				if (node.shape.type === 'circle') tools.set(node.code, node.shape.diameter);
				break;
			case 'toolChange':
				tool = node.code;
				break;
			case 'loadPolarity':
				polarity = node.polarity;
				break;
			case 'interpolateMode':
				mode = node.mode === 'cwArc' ? 'cw' : node.mode === 'ccwArc' ? 'ccw' : 'line';
				break;
			case 'regionMode':
				if (!node.region) closeContour();
				inRegion = node.region;
				break;
			case 'graphic': {
				const c = node.coordinates;
				const to: [number, number] = [num(c.x, current[0]), num(c.y, current[1])];
				if (node.graphic === 'move') {
					if (inRegion) closeContour();
				} else if (node.graphic === 'segment') {
					const seg: ReadSegment = { kind: mode, from: current, to };
					if (mode !== 'line') seg.center = [current[0] + num(c.i, 0), current[1] + num(c.j, 0)];
					(inRegion ? contour : strokes).push(seg);
				} else if (node.graphic === 'shape') {
					flashes.push({ polarity, at: to, diameterMm: tools.get(tool) ?? NaN });
				}
				current = to;
				break;
			}
		}
	}
	return { tree, regions, flashes, strokes, fileAttributes };
}

/** Flattens a read contour into a ring (closed, first point repeated) with ≤ 0.1 µm chord sag. */
export function ringOfReadContour(contour: ReadSegment[]): [number, number][] {
	const pts: [number, number][] = [contour[0].from];
	for (const s of contour) {
		if (s.kind !== 'line' && s.center) {
			const [cx, cy] = s.center;
			const r = Math.hypot(s.from[0] - cx, s.from[1] - cy);
			const a0 = Math.atan2(s.from[1] - cy, s.from[0] - cx);
			let a1 = Math.atan2(s.to[1] - cy, s.to[0] - cx);
			if (s.kind === 'ccw') while (a1 <= a0) a1 += 2 * Math.PI;
			else while (a1 >= a0) a1 -= 2 * Math.PI;
			const steps = Math.max(8, Math.ceil(Math.abs(a1 - a0) / (2 * Math.acos(1 - 1e-4 / r))));
			for (let k = 1; k < steps; k++) {
				const a = a0 + ((a1 - a0) * k) / steps;
				pts.push([cx + r * Math.cos(a), cy + r * Math.sin(a)]);
			}
		}
		pts.push(s.to);
	}
	return pts;
}

export function circleRing([cx, cy]: [number, number], diameterMm: number): [number, number][] {
	const r = diameterMm / 2;
	const steps = Math.max(64, Math.ceil((2 * Math.PI) / (2 * Math.acos(1 - 1e-4 / r))));
	const pts: [number, number][] = [];
	for (let k = 0; k < steps; k++) pts.push([cx + r * Math.cos((2 * Math.PI * k) / steps), cy + r * Math.sin((2 * Math.PI * k) / steps)]);
	pts.push(pts[0]);
	return pts;
}
