// An Excellon file's text → plated or not (from its X2 comment) and its holes, via @tracespace/parser.
import type { FabHole } from './fab-view';
import { parseGerberTree } from './read-gerber';
import { lengthInMm, parseCoordinateMm, type NumberFormat } from './parse-coordinate';

export interface ReadDrill {
	/** From "; #@! TF.FileFunction,Plated,…" or "NonPlated"; null when absent. */
	readonly plated: boolean | null;
	readonly holes: FabHole[];
	readonly problems: { readonly kind: 'file-unreadable' | 'file-unsupported'; readonly message: string }[];
}

export function readDrill(text: string): ReadDrill {
	const tree = parseGerberTree(text); // one parser reads both formats
	const problems: ReadDrill['problems'] = [];
	if (tree.filetype !== 'drill') problems.push({ kind: 'file-unreadable', message: 'not recognised as an Excellon drill file' });
	if (!tree.done) problems.push({ kind: 'file-unreadable', message: 'no end-of-program (M30): the file is cut short or broken' });
	let nf: NumberFormat = { format: null, zeroSuppression: null, units: 'mm' };
	let plated: boolean | null = null;
	let tool: string | null = null;
	let drilling = true;
	let current: [number, number] = [0, 0];
	const tools = new Map<string, number>();
	const holes: FabHole[] = [];
	for (const node of tree.children) {
		switch (node.type) {
			case 'comment': {
				const m = /TF\.FileFunction,(Plated|NonPlated)\b/.exec(node.comment);
				if (m) plated = m[1] === 'Plated';
				break;
			}
			case 'units':
				nf = { ...nf, units: node.units };
				break;
			case 'coordinateFormat':
				if (node.mode === 'incremental') problems.push({ kind: 'file-unsupported', message: 'incremental coordinates' });
				nf = { ...nf, format: node.format ?? nf.format, zeroSuppression: node.zeroSuppression ?? nf.zeroSuppression };
				break;
			case 'toolDefinition':
				if (node.shape.type !== 'circle') problems.push({ kind: 'file-unsupported', message: `tool T${node.code} is not round` });
				else tools.set(node.code, lengthInMm(node.shape.diameter, nf.units));
				break;
			case 'toolChange':
				tool = node.code;
				break;
			case 'interpolateMode':
				drilling = node.mode === 'drill';
				if (!drilling && node.mode !== 'move') problems.push({ kind: 'file-unsupported', message: `routing (${node.mode})` });
				break;
			case 'unimplemented':
				problems.push({ kind: 'file-unsupported', message: `command not read: ${node.value.slice(0, 40)}` });
				break;
			case 'graphic': {
				const c = node.coordinates;
				current = [c.x === undefined ? current[0] : parseCoordinateMm(c.x, nf), c.y === undefined ? current[1] : parseCoordinateMm(c.y, nf)];
				const isHit = node.graphic === 'shape' || (node.graphic === null && drilling);
				if (node.graphic === 'slot') problems.push({ kind: 'file-unsupported', message: 'a routed slot' });
				else if (isHit) {
					const d = tool ? tools.get(tool) : undefined;
					if (d === undefined) problems.push({ kind: 'file-unreadable', message: 'a hit without a defined tool' });
					else holes.push({ xMm: current[0], yMm: current[1], diameterMm: d });
				}
				break;
			}
		}
	}
	return { plated, holes, problems };
}
