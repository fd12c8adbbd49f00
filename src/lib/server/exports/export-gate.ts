// The design-rule gate: the revision's artwork against the profile it recorded, before anything is built.
import { buildArtwork, type Artwork } from '$lib/artwork';
import { checkArtwork, type Violation } from '$lib/drc';
import type { SizedDesign } from '$lib/rf';
import type { FabProfile } from '$lib/schemas/fab-profile';
import { getDb } from '../db';
import { revisionFabProfile } from '../fab-profiles';
import type { ExportTarget } from './export-target';

export interface GateReport {
	artwork: Artwork;
	profile: FabProfile;
	/** False for a revision older than the gate, checked against the built-in. */
	profileRecorded: boolean;
	violations: Violation[];
}

export async function checkExportTarget(target: ExportTarget): Promise<GateReport> {
	const { profile, recorded } = await revisionFabProfile(getDb(), target.revision.id);
	const artwork = buildArtwork(target.revision.results as SizedDesign);
	return { artwork, profile, profileRecorded: recorded, violations: checkArtwork(artwork, profile) };
}
