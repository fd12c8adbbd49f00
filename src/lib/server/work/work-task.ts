// What a worker thread can be asked to do, and the answers: plain data both ways (structured clone).
import type { Violation } from '$lib/drc';
import type { SizedDesign } from '$lib/rf';
import type { FabProfile } from '$lib/schemas/fab-profile';
import { buildExportBytes, checkRevisionArtwork, type ExportBuildInput, type ExportBuildReport } from '../exports/export-work';
import { checkRevision, readBackRevision, type RevisionCheck, type RevisionReadBack, type RevisionViewInput } from '../revision-view/revision-view-work';
import { writeSweepFile, type SweepBuildInput, type SweepFileFacts } from '../sweeps/sweep-work';

export type WorkTask =
	/** The design-rule check of a revision's artwork (the refusal page). */
	| { type: 'gate'; sized: SizedDesign; profile: FabProfile }
	/** One download, gate included. */
	| { type: 'export'; input: ExportBuildInput }
	/** A sweep plan's file, written to the cache. */
	| { type: 'sweep'; job: SweepBuildInput }
	/** The revision page's artwork and design-rule check. */
	| { type: 'revision-check'; input: RevisionViewInput }
	/** The revision page's fab view: its Gerber + drill set read back. */
	| { type: 'revision-read-back'; input: RevisionViewInput };

export type WorkResult =
	| { type: 'gate'; violations: Violation[] }
	| { type: 'export'; report: ExportBuildReport }
	| { type: 'sweep'; facts: SweepFileFacts }
	| { type: 'revision-check'; check: RevisionCheck }
	| { type: 'revision-read-back'; readBack: RevisionReadBack };

export async function runTask(task: WorkTask): Promise<WorkResult> {
	switch (task.type) {
		case 'gate':
			return { type: 'gate', violations: checkRevisionArtwork(task.sized, task.profile) };
		case 'export':
			return { type: 'export', report: await buildExportBytes(task.input) };
		case 'sweep':
			return { type: 'sweep', facts: await writeSweepFile(task.job) };
		case 'revision-check':
			return { type: 'revision-check', check: checkRevision(task.input) };
		case 'revision-read-back':
			return { type: 'revision-read-back', readBack: readBackRevision(task.input) };
	}
}
