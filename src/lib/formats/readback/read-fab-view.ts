// Every Gerber and Excellon file of a bundle → what the board house sees: layer images, holes, board extents.
import type { FabDrillFile, FabFile, FabLayerImage, FabView, ReadBackMismatch } from './fab-view';
import { layerKeyOfFileFunction } from './artwork-image';
import { composeImage, toFabPolygons } from './image-item';
import { readDrill } from './read-drill';
import { readGerber } from './read-gerber';
import { strokeInkArea, strokeInkBounds } from './stroke-ink';

function textOf(f: FabFile): string {
	const content = 'bytes' in f ? f.bytes : f.text;
	return typeof content === 'string' ? content : new TextDecoder('utf-8').decode(content);
}

/** A drill file starts with M48 (Excellon header) or carries the drill X2 comment; everything else is read as Gerber. */
function looksLikeDrill(text: string): boolean {
	return /^\s*M48\b/.test(text) || /TF\.FileFunction,(Plated|NonPlated)\b/.test(text);
}

/** Reads every file; files it cannot trust are reported in `problems`, never guessed at. */
export function readFabView(files: readonly FabFile[]): FabView {
	const layers: FabLayerImage[] = [];
	const drills: FabDrillFile[] = [];
	const problems: ReadBackMismatch[] = [];
	let board: FabView['board'] = null;
	for (const file of files) {
		const text = textOf(file);
		const problem = (check: ReadBackMismatch['check'], message: string, layerKey: string | null = null) =>
			problems.push({ check, fileName: file.name, layerKey, message: `${file.name}: ${message}` });
		if (looksLikeDrill(text)) {
			const read = readDrill(text);
			read.problems.forEach((p) => problem(p.kind, p.message));
			if (read.plated === null) problem('file-unidentified', 'no TF.FileFunction comment saying plated or non-plated');
			else drills.push({ fileName: file.name, plated: read.plated, holes: read.holes });
			continue;
		}
		const read = readGerber(text);
		const key = read.fileFunction ? layerKeyOfFileFunction(read.fileFunction) : null;
		read.problems.forEach((p) => problem(p.kind, p.message, key));
		if (!key) {
			problem('file-unidentified', read.fileFunction ? `file function ${read.fileFunction.join(',')} is not one we write` : 'no %TF.FileFunction attribute');
			continue;
		}
		if (key === 'profile') {
			board = read.strokeBounds;
			layers.push({ fileName: file.name, key, polygons: [], areaMm2: 0, bounds: read.strokeBounds });
			continue;
		}
		if (key.startsWith('legend-')) {
			layers.push({ fileName: file.name, key, polygons: read.items.map((i) => ({ outer: i.rings[0].map(([x, y]): [number, number] => [x, y]), holes: [] })), areaMm2: strokeInkArea(read.strokes), bounds: strokeInkBounds(read.strokes), strokes: read.strokes });
			continue;
		}
		const image = composeImage(read.items);
		layers.push({ fileName: file.name, key, polygons: toFabPolygons(image.regions), areaMm2: image.areaMm2, bounds: image.bounds });
	}
	return { layers, drills, board, problems };
}
