// SVG writer: typed element tree, then text (the DOM-free serializer, byte for byte what svg.js on svgdom writes).
export * from './commands';
export { buildSvgTree, svgNumber, SVG_MARGINS_MM } from './build';
export { serializeSvg, type SvgWindow } from './serialize';
export { serializeSvgText } from './serialize-text';
import type { Artwork } from '../../artwork';
import type { ExportMeta } from '../export-meta';
import { buildSvgTree } from './build';
import type { SvgWindow } from './serialize';
import { serializeSvgText } from './serialize-text';

/**
 * The artwork as SVG text. `window` is kept for callers (and for `serializeSvg`, the svg.js
 * reference the tests hold this output to); the text itself is built without a DOM so large
 * arrays stay linear in time.
 */
export function toSvg(artwork: Artwork, meta: ExportMeta, window: SvgWindow): string {
	void window;
	return serializeSvgText(buildSvgTree(artwork, meta));
}
