// Gerber writer: typed commands, then text.
export * from './commands';
export { buildGerberCommands, gerberFileFunction } from './build';
export { serializeGerber, toGerberCoordinate, fromGerberCoordinate } from './serialize';
import type { Artwork } from '../../artwork';
import type { ExportMeta } from '../export-meta';
import { buildGerberCommands } from './build';
import { serializeGerber } from './serialize';

/** One layer of the artwork as Gerber X2 text. */
export function toGerber(artwork: Artwork, layerId: string, meta: ExportMeta): string {
	return serializeGerber(buildGerberCommands(artwork, layerId, meta));
}
