// The design-rule gate: the revision's prepared artwork against the profile it recorded, before anything is built.
import type { Artwork } from '$lib/artwork';
import { gate, prepareSized, type PreparedDesign } from '$lib/design';
import type { Violation } from '$lib/drc';
import type { FabProfile } from '$lib/schemas/fab-profile';
import { getDb } from '../db';
import { revisionFabProfile } from '../fab-profiles';
import type { ExportTarget } from './export-target';

export interface GateReport {
	/** The revision prepared once (sized design and artwork): the download's files are written from it. */
	prepared: PreparedDesign;
	artwork: Artwork;
	profile: FabProfile;
	/** False for a revision older than the gate, checked against the built-in. */
	profileRecorded: boolean;
	violations: Violation[];
}

export async function checkExportTarget(target: ExportTarget): Promise<GateReport> {
	const { profile, recorded } = await revisionFabProfile(getDb(), target.revision.id);
	const prepared = prepareSized(target.revision.results);
	return { prepared, artwork: prepared.artwork, profile, profileRecorded: recorded, violations: gate(prepared, profile) };
}
