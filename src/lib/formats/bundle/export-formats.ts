// The file families an export can hold, and the parser for a comma-separated list of them.
import { InputError } from '../../schemas';

export const exportFormats = ['gerber', 'drill', 'dxf', 'svg', 'sweep', 'notes'] as const;
export type ExportFormat = (typeof exportFormats)[number];

/** "gerber,drill" → ['gerber', 'drill'] in canonical order; unknown or empty names are an InputError. */
export function parseExportFormats(list: string, path = 'formats'): ExportFormat[] {
	const names = list.split(',').map((s) => s.trim()).filter(Boolean);
	const unknown = names.find((n) => !(exportFormats as readonly string[]).includes(n));
	if (unknown !== undefined || names.length === 0) {
		throw new InputError([{ path, value: unknown ?? list, message: `must be a comma-separated list of: ${exportFormats.join(', ')}` }]);
	}
	return exportFormats.filter((f) => names.includes(f));
}
