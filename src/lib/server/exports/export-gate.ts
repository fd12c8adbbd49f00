// The design-rule gate: the revision's artwork against the profile it recorded, before anything is built.
// The check runs on a worker thread (a large array takes seconds), within the work budget.
import type { Violation } from '$lib/drc';
import type { SizedDesign } from '$lib/rf';
import { copperLayerCountOf } from '$lib/schemas';
import type { FabProfile } from '$lib/schemas/fab-profile';
import { getDb } from '../db';
import { revisionFabProfile } from '../fab-profiles';
import { runBudgetedWork } from '../work';
import type { ExportTarget } from './export-target';
import { createImmutableCache } from './immutable-cache';

export interface GateReport {
	profile: FabProfile;
	/** False for a revision older than the gate, checked against the built-in. */
	profileRecorded: boolean;
	violations: Violation[];
}

/** The revision's profile is written with it and never changes, so its report is computed once per process. */
const reports = createImmutableCache<GateReport>({ maxEntries: 256, maxBytes: Number.POSITIVE_INFINITY, sizeOf: () => 0 });

export function checkExportTarget(target: ExportTarget): Promise<GateReport> {
	return reports.get(target.revision.id, async () => {
		const { profile, recorded } = await revisionFabProfile(getDb(), target.revision.id, copperLayerCountOf((target.revision.results as SizedDesign).input));
		const { violations } = await runBudgetedWork(
			{ type: 'gate', sized: target.revision.results as SizedDesign, profile },
			{ what: `The design-rule check of revision ${target.revision.label}` }
		);
		return { profile, profileRecorded: recorded, violations };
	});
}
