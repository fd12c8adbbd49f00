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
