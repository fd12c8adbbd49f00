// Excellon drill writer: typed commands, then text.
export * from './commands';
export { buildExcellonCommands } from './build';
export { serializeExcellon, EXCELLON_DECIMAL_PLACES } from './serialize';
import type { Artwork } from '../../artwork';
import type { ExportMeta } from '../export-meta';
import { buildExcellonCommands } from './build';
import { serializeExcellon } from './serialize';

/** The plated (or non-plated) holes of the artwork as Excellon text. */
export function toExcellon(artwork: Artwork, plated: boolean, meta: ExportMeta): string {
	return serializeExcellon(buildExcellonCommands(artwork, plated, meta));
}
