// DXF writer: typed entities, then text through dxf-writer.
export * from './commands';
export { buildDxfCommands, dxfLayerName, DXF_PLATED_DRILL_LAYER, DXF_NON_PLATED_DRILL_LAYER } from './build';
export { serializeDxf } from './serialize';
import type { Artwork } from '../../artwork';
import { buildDxfCommands } from './build';
import { serializeDxf } from './serialize';

export function toDxf(artwork: Artwork): string {
	return serializeDxf(buildDxfCommands(artwork));
}
