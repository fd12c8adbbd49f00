// SVG writer: typed element tree, then text through svg.js.
export * from './commands';
export { buildSvgTree, svgNumber, SVG_MARGINS_MM } from './build';
export { serializeSvg, type SvgWindow } from './serialize';
import type { Artwork } from '../../artwork';
import type { ExportMeta } from '../export-meta';
import { buildSvgTree } from './build';
import { serializeSvg, type SvgWindow } from './serialize';

export function toSvg(artwork: Artwork, meta: ExportMeta, window: SvgWindow): string {
	return serializeSvg(buildSvgTree(artwork, meta), window);
}
