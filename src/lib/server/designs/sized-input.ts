// Validates a design-input document and sizes it; anything the core cannot build becomes an InputError.
import { buildArtwork } from '../../artwork';
import { GeometryError } from '../../geometry';
import { size, type SizedDesign } from '../../rf';
import { InputError, parseDesignInput, type DesignInput } from '../../schemas';

/** The input field a geometry error is about, so the editor can show it beside that field. */
const GEOMETRY_PATHS: Record<string, string> = {
	'feed-longer-than-margin': 'groundMarginMm',
	'notch-outside-patch': 'inset.notchGapMm',
	'probe-outside-patch': 'probe.padDiameterMm',
	'clearance-outside-ground': 'probe.clearanceDiameterMm'
};

export interface SizedInput {
	input: DesignInput;
	sized: SizedDesign;
}

/** Throws InputError (with field paths) for bad or unbuildable input; never writes anything. */
export function sizeInput(raw: unknown): SizedInput {
	const input = parseDesignInput(raw);
	const sized = size(input);
	try {
		buildArtwork(sized);
	} catch (err) {
		if (err instanceof GeometryError) {
			const path = GEOMETRY_PATHS[err.code] ?? '';
			throw new InputError([{ path, value: path ? valueAt(input, path) : undefined, message: err.message }]);
		}
		throw err;
	}
	return { input, sized };
}

function valueAt(root: unknown, path: string): unknown {
	let node = root;
	for (const key of path.split('.')) node = node && typeof node === 'object' ? (node as Record<string, unknown>)[key] : undefined;
	return node;
}
