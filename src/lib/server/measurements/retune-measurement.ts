// Retune from a measurement: the proposal (apparent εr, old vs new dimensions), and on confirmation a new revision linked to it.
import type { Kysely } from 'kysely';
import { copperLayerCountOf } from '../../schemas/design-input';
import { proposeRetune, type RetuneProposal } from '../../rf/retune';
import type { Database } from '../db/database';
import type { Revision } from '../designs/design-model';
import { saveRevision, type SavedRevision } from '../designs/save-revision';
import { revisionFabProfile } from '../fab-profiles';
import type { Measurement } from './measurement-model';

export interface RetuneChoice {
	/** Keep the built patch width and solve only the length (rectangular patches). */
	holdWidth?: boolean;
}

/** Throws InputError when no laminate εr in (1, 30] explains the measured resonance. */
export function retuneProposal(revision: Revision, measurement: Measurement, choice: RetuneChoice = {}): RetuneProposal {
	return proposeRetune(revision.input, measurement.summary.resonance.frequencyHz, { holdWidth: choice.holdWidth === true });
}

function megahertz(hz: number): string {
	return `${(hz / 1e6).toFixed(1)} MHz`;
}

/**
 * Saves the proposal as a new revision whose parent is the measured revision and whose history names the
 * measurement. The proposal is recomputed here from the stored data, never taken from the form. The new
 * revision is checked against the fab profile its parent recorded (the same board house builds the retune).
 */
export async function confirmRetune(
	db: Kysely<Database>,
	opts: { designId: string; revision: Revision; measurement: Measurement; userId: string } & RetuneChoice
): Promise<SavedRevision & { proposal: RetuneProposal }> {
	const proposal = retuneProposal(opts.revision, opts.measurement, opts);
	const note =
		`Retuned from measurement ${opts.measurement.fileName} of ${opts.revision.label}: resonance ${megahertz(proposal.measuredFrequencyHz)} ` +
		`(target ${megahertz(proposal.targetFrequencyHz)}), apparent εr ${proposal.apparentRelativePermittivity} (designed ${proposal.designRelativePermittivity}).`;
	const parentFab = await revisionFabProfile(db, opts.revision.id, copperLayerCountOf(opts.revision.input));
	const saved = await saveRevision(db, {
		designId: opts.designId,
		parentLabel: opts.revision.label,
		userId: opts.userId,
		raw: proposal.input,
		note: note.slice(0, 500),
		retunedFromMeasurementId: opts.measurement.id,
		fabProfile: parentFab.profile
	});
	return { ...saved, proposal };
}
