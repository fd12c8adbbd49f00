// The self-check before a bundle is offered: read our own Gerber and drill files back and compare with the artwork.
import type { Artwork } from '../../artwork';
import { compareFabView } from './compare-fab-view';
import type { FabFile, FabView, ReadBackMismatch } from './fab-view';
import { readFabView } from './read-fab-view';

export interface ReadBackResult {
	/** True when nothing differs: the files may ship. */
	readonly ok: boolean;
	readonly mismatches: ReadBackMismatch[];
	/** The layers and holes "as the fab sees them", for the editor's second preview. */
	readonly view: FabView;
}

/**
 * Pass every Gerber and Excellon file just written for `artwork` (not DXF/SVG/JSON). A mismatch
 * is a writer bug, never the user's: refuse the export as an internal error and log the list.
 */
export function checkReadBack(artwork: Artwork, files: readonly FabFile[]): ReadBackResult {
	const view = readFabView(files);
	const mismatches = compareFabView(artwork, view);
	return { ok: mismatches.length === 0, mismatches, view };
}
