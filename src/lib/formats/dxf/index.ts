// DXF writer: typed entities, then text through dxf-writer.
export * from './commands';
export { buildDxfCommands, dxfLayerName, DXF_DIMENSION_LAYER, DXF_TEXT_HEIGHT_PER_EM, DXF_PLATED_DRILL_LAYER, DXF_NON_PLATED_DRILL_LAYER, DXF_TITLE_LAYER } from './build';
export { serializeDxf } from './serialize';
import type { Artwork } from '../../artwork';
import type { DrawingSheetOptions } from '../drawing-sheet';
import type { ExportMeta } from '../export-meta';
import { buildDxfCommands } from './build';
import { serializeDxf } from './serialize';

/** The artwork as DXF; with the revision's meta also the dimensions and title block (layers FF-DIMENSIONS, FF-TITLE). */
export function toDxf(artwork: Artwork, meta?: ExportMeta, options: DrawingSheetOptions = {}): string {
	return serializeDxf(buildDxfCommands(artwork, meta, options));
}
