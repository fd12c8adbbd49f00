// Why an export was refused: design-rule violations (the user's to fix or waive), or files that failed their read-back (our bug).
import type { Violation } from '$lib/drc';
import type { FabProfile } from '$lib/schemas/fab-profile';
import type { ReadBackMismatch } from '$lib/formats/readback';

/** The revision breaks its fab profile and no waiver was given: nothing is built, nothing is recorded. */
export class ExportRefusedError extends Error {
	constructor(
		readonly violations: readonly Violation[],
		readonly profile: FabProfile
	) {
		super(`The artwork breaks ${violations.length} design rule${violations.length === 1 ? '' : 's'} of the "${profile.name}" profile`);
		this.name = 'ExportRefusedError';
	}
}

/**
 * The files just written do not read back as the artwork: a writer bug that must never reach a fab.
 * The mismatches are logged under `supportId`; the caller sees only the id.
 */
export class ReadBackFailedError extends Error {
	constructor(
		readonly supportId: string,
		readonly mismatches: readonly ReadBackMismatch[]
	) {
		super(`The export failed its own read-back check and was not delivered. Support id: ${supportId}`);
		this.name = 'ReadBackFailedError';
	}
}
