// A refused export as the routes answer it: the 422 body with every violation and the profile, and the 500 body of a failed read-back.
import { error, isHttpError } from '@sveltejs/kit';
import type { Violation } from '$lib/drc';
import type { FabProfile } from '$lib/schemas/fab-profile';
import { ExportRefusedError, ReadBackFailedError } from './export-refusal';

export interface RefusalBody {
	/** One sentence: how many rules of which profile. */
	message: string;
	profile: FabProfile;
	violations: readonly Violation[];
}

export function refusalBody(err: ExportRefusedError): RefusalBody {
	return { message: err.message, profile: err.profile, violations: err.violations };
}

/**
 * Turns the exports' own refusals into SvelteKit HTTP errors, so that any route (even one that only
 * knows HTTP errors) answers 422 for violations and 500 with a support id for a failed read-back.
 */
export function asHttpRefusal(err: unknown): unknown {
	if (err instanceof ExportRefusedError) {
		try {
			error(422, refusalBody(err) as unknown as App.Error);
		} catch (httpError) {
			return httpError;
		}
	}
	if (err instanceof ReadBackFailedError) {
		try {
			error(500, { message: err.message, errorId: err.supportId });
		} catch (httpError) {
			return httpError;
		}
	}
	return err;
}

/** The violations of a refusal thrown by exportForRequest, or null for any other error. */
export function refusalOf(err: unknown): RefusalBody | null {
	if (isHttpError(err) && err.status === 422 && 'violations' in (err.body as object)) return err.body as unknown as RefusalBody;
	return null;
}

/** The support id of a read-back failure thrown by exportForRequest, or null. */
export function readBackSupportIdOf(err: unknown): string | null {
	return isHttpError(err) && err.status === 500 && err.body.errorId ? err.body.errorId : null;
}
