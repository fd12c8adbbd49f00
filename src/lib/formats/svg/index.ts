// SVG writer: typed element tree, then text (a DOM-free serializer; the tests hold it to svg.js on svgdom, byte for byte).
export * from './commands';
export { buildSvgTree, svgNumber } from './build';
export { serializeSvgText } from './serialize-text';
export { contourPathData, outlinePathData } from './outline-path';
import type { Artwork } from '../../artwork';
import type { DrawingSheetOptions } from '../drawing-sheet';
import type { ExportMeta } from '../export-meta';
import { buildSvgTree } from './build';
import { serializeSvgText } from './serialize-text';

/** The artwork as SVG text, built without a DOM so large arrays stay linear in time. */
export function toSvg(artwork: Artwork, meta: ExportMeta, options: DrawingSheetOptions = {}): string {
	return serializeSvgText(buildSvgTree(artwork, meta, options));
}
