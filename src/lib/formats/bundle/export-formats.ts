// The file families an export can hold, and the parser for a comma-separated list of them.
import { InputError } from '../../schemas';

/** The formats of the default bundle (the CLI's default too): its bytes, and so its hash, stay as they were. */
export const exportFormats = ['gerber', 'drill', 'dxf', 'svg', 'sweep', 'notes'] as const;
/** Formats offered only when asked for by name (`--formats step`, their own download); never in the default bundle. */
export const optionalExportFormats = ['step'] as const;
/** Every format a list may name, in canonical order. */
export const allExportFormats = [...exportFormats, ...optionalExportFormats] as const;
export type ExportFormat = (typeof allExportFormats)[number];

/** "gerber,drill" → ['gerber', 'drill'] in canonical order; unknown or empty names are an InputError. */
export function parseExportFormats(list: string, path = 'formats'): ExportFormat[] {
	const names = list.split(',').map((s) => s.trim()).filter(Boolean);
	const unknown = names.find((n) => !(allExportFormats as readonly string[]).includes(n));
	if (unknown !== undefined || names.length === 0) {
		throw new InputError([{ path, value: unknown ?? list, message: `must be a comma-separated list of: ${allExportFormats.join(', ')}` }]);
	}
	return allExportFormats.filter((f) => names.includes(f));
}
