// A comma-separated list of format ids (the CLI's --formats) → ids in the registry's order; unknown or empty is an InputError.
import { InputError } from '../schemas';
import { formatIds, type FormatId } from './format-ids';

export function parseFormatList(list: string, path = 'formats'): FormatId[] {
	const names = list.split(',').map((s) => s.trim()).filter(Boolean);
	const unknown = names.find((n) => !(formatIds as readonly string[]).includes(n));
	if (unknown !== undefined || names.length === 0) {
		throw new InputError([{ path, value: unknown ?? list, message: `must be a comma-separated list of: ${formatIds.join(', ')}` }]);
	}
	return formatIds.filter((f) => names.includes(f));
}
