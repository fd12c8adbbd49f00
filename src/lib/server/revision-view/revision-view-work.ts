// The revision page's heavy half, run on a worker thread (see ../work): the stored sizing prepared into its artwork,
// the design-rule check against the profile the page shows, and the fab view's Gerber + drill read-back. Plain data in
// and out (structured clone, then devalue to the browser), so the page's components only draw what they are given.
import type { Artwork, ArtworkShape } from '$lib/artwork';
import { gate, prepareSized, readBack, type PreparedDesign } from '$lib/design';
import type { Violation } from '$lib/drc';
import { applicableFormats, drawingSheetOptions, type DrawingSheetOptions, type ExportMeta, type FormatId } from '$lib/formats';
import type { ReadBackResult } from '$lib/formats/readback';
import type { SizedDesign } from '$lib/rf';
import type { FabProfile } from '$lib/schemas/fab-profile';

/**
 * The most shapes (every layer's shapes plus the drills) the revision page draws and reads back. A 16 × 16 array
 * (1 806 shapes: about 1 MB of artwork for the browser, under a second of read-back) is drawn; a 32 × 32 one (about
 * 7 200 shapes, 4 MB) and the 64 × 64 one (about 28 800 shapes, 16 MB of artwork and 26 s of read-back on one core)
 * are not. Measured on this machine with `arrayBenchDocument`; the limit itself is a product choice (no source).
 */
export const REVISION_DRAWING_SHAPE_LIMIT = 4000;

export interface RevisionViewInput {
	/** The sized design stored with the revision. */
	sized: SizedDesign;
	/** The profile the page checks against (the recorded one, or the one ?profile= names). */
	profile: FabProfile;
	/** The profile recorded with the revision: the drawing copied for mechanical CAD is sized to it, as downloaded. */
	recordedProfile: FabProfile;
	meta: ExportMeta;
}

export interface RevisionCheck {
	violations: Violation[];
	/** Shapes on every layer plus drills: what the drawing limit counts. */
	shapeCount: number;
	/** The whole artwork when it is within REVISION_DRAWING_SHAPE_LIMIT, else null (not drawn, not sent). */
	artwork: Artwork | null;
	/**
	 * What the page's tables read (the board, the stack, each layer's kind and what it carries): the artwork with one
	 * shape of each role per layer, its geometry a token circle, and at most one drill. A few kB whatever the design
	 * (a 64 × 64 array's feed network alone is one 3 MB region); never drawn.
	 */
	outline: Artwork;
	/** The formats that apply to the whole artwork (no holes: no drill file), in registry order. */
	formatIds: FormatId[];
	/** The drawing sheet's options as downloaded (the recorded profile's resolution, the laminate's name). */
	sheetOptions: DrawingSheetOptions;
}

/** The read-back of the revision's Gerber + drill set, or null when the artwork is over the drawing limit (not read). */
export type RevisionReadBack = { shapeCount: number; result: ReadBackResult | null };

export function shapeCountOf(artwork: Artwork): number {
	return artwork.layers.reduce((n, l) => n + l.shapes.length, 0) + artwork.drills.length;
}

/** One shape of each role (in order of first appearance), each standing for its role only: a token circle at the origin. */
function rolesOf(shapes: readonly ArtworkShape[]): ArtworkShape[] {
	const seen = new Set<string>();
	return shapes
		.filter((s) => (seen.has(s.role) ? false : (seen.add(s.role), true)))
		.map((s) => ({ id: s.id, role: s.role, polarity: s.polarity, geometry: { kind: 'circle', center: [0, 0], diameterMm: 1 } }) as ArtworkShape);
}

/** The artwork's outline for the tables: the board, the stack and every layer kept, one token shape per role and layer, one drill. */
export function artworkOutline(artwork: Artwork): Artwork {
	return { ...artwork, layers: artwork.layers.map((l) => ({ ...l, shapes: rolesOf(l.shapes), voids: [] })), drills: artwork.drills.slice(0, 1) };
}

export function checkRevision(input: RevisionViewInput): RevisionCheck {
	const prepared: PreparedDesign = prepareSized(input.sized);
	const shapeCount = shapeCountOf(prepared.artwork);
	return {
		violations: gate(prepared, input.profile),
		shapeCount,
		artwork: shapeCount <= REVISION_DRAWING_SHAPE_LIMIT ? prepared.artwork : null,
		outline: artworkOutline(prepared.artwork),
		formatIds: applicableFormats(prepared.artwork).map((f) => f.id),
		sheetOptions: drawingSheetOptions(prepared, input.recordedProfile)
	};
}

/** No files delivered: the pipeline writes the whole Gerber + drill set from the prepared artwork and reads it back. */
export function readBackRevision(input: RevisionViewInput): RevisionReadBack {
	const prepared = prepareSized(input.sized);
	const shapeCount = shapeCountOf(prepared.artwork);
	return { shapeCount, result: shapeCount <= REVISION_DRAWING_SHAPE_LIMIT ? readBack([], prepared, input.meta) : null };
}
