// Input document → validated input, sized design and artwork, or the issues that stop it. Pure: the editor
// runs it on every keystroke in the browser, and the server runs it before saving a revision.
import type { Artwork } from '../artwork';
import { GeometryError } from '../geometry';
import type { SizedDesign } from '../rf';
import { prepare } from './pipeline';
import { designInputSchema, fromZodError, InputError, type DesignInput, type InputIssue } from '../schemas';

/** The input field a geometry error is about, so the editor shows it beside that field. */
const GEOMETRY_PATHS: Record<string, string> = {
	'feed-longer-than-margin': 'groundMarginMm',
	'notch-outside-patch': 'inset.notchGapMm',
	'probe-outside-patch': 'probe.padDiameterMm',
	'clearance-outside-ground': 'probe.clearanceDiameterMm'
};

/** The field a geometry error is about: by its code, or (an array that does not fit) by the spacing its message names. */
function geometryPath(err: GeometryError): string {
	if (err.code === 'elements-overlap' || err.code === 'feed-network-crowded' || err.code === 'network-arm-too-short') return err.message.startsWith('array.spacingYWavelengths') ? 'array.spacingYWavelengths' : 'array.spacingXWavelengths';
	if (err.code === 'launch-does-not-fit') return err.message.startsWith('launch.gapMm') ? 'launch.gapMm' : 'launch.kind';
	return GEOMETRY_PATHS[err.code] ?? '';
}

export type SizingOutcome =
	| { ok: true; input: DesignInput; sized: SizedDesign; artwork: Artwork }
	| { ok: false; issues: InputIssue[] };

export function sizeDocument(raw: unknown): SizingOutcome {
	const parsed = designInputSchema.safeParse(raw);
	if (!parsed.success) return { ok: false, issues: fromZodError(parsed.error, raw).issues };
	try {
		const { sized, artwork } = prepare(parsed.data);
		// sized.input is the complete document, with an assumed tanδ written in (and named by a warning)
		return { ok: true, input: sized.input, sized, artwork };
	} catch (err) {
		if (err instanceof InputError) return { ok: false, issues: err.issues };
		if (err instanceof GeometryError) {
			const path = geometryPath(err);
			return { ok: false, issues: [{ path, value: path ? valueAt(parsed.data, path) : undefined, message: err.message }] };
		}
		throw err;
	}
}

function valueAt(root: unknown, path: string): unknown {
	let node = root;
	for (const key of path.split('.')) node = node && typeof node === 'object' ? (node as Record<string, unknown>)[key] : undefined;
	return node;
}

/**
 * Above this many array elements the editor neither sizes, draws nor checks the live artwork: the server render skips it,
 * and the revision page builds and checks the saved revision on the work pool. A 16 × 16 array (256) builds and checks in
 * about 0.1 s on one core here; a 64 × 64 one takes about 0.7 s and its preview is megabytes (measured, no outside source).
 */
export const LIVE_PREVIEW_ELEMENT_LIMIT = 256;

/** How many elements the editor's form values make (1 without the array switch; NaN-safe: junk counts as 1). */
export function elementCountOfFormValues(values: Record<string, string>): number {
	if (values.array !== 'on') return 1;
	const count = (text: string | undefined) => {
		const n = Number(text);
		return Number.isFinite(n) && n >= 1 ? Math.floor(n) : 1;
	};
	return count(values['array.columns']) * count(values['array.rows']);
}

