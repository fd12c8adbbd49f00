// Saving makes a new revision from a parent. The design row is locked while the next label is chosen,
// so two editors saving from the same parent each get their own revision (a fork), never an overwrite.
import { randomUUID } from 'node:crypto';
import type { Kysely } from 'kysely';
import { builtInFabProfileFor, copperLayerCountOf, InputError, parseRevisionNote } from '../../schemas';
import type { FabProfile } from '../../schemas/fab-profile';
import type { Database } from '../db/database';
import * as designQueries from '../db/design.queries';
import { revisionLabel } from './revision-label';
import { sizeInput } from './sized-input';

export interface SaveRevisionOptions {
	designId: string;
	/** Label of the revision this one was edited from. */
	parentLabel: string;
	userId: string;
	/** A design-input document. */
	raw: unknown;
	note?: string;
	/** Set by a retune: the measurement this revision was retuned from (stored at insert; revisions never change). */
	retunedFromMeasurementId?: string;
	/** Set when made from a Homing study's tuned input: the study (stored at insert; revisions never change). */
	homedFromFieldCheckId?: string;
	/** The fab profile values this revision is checked against (stored at insert; absent: the database's built-in default). */
	fabProfile?: FabProfile;
}

export interface SavedRevision {
	id: string;
	label: string;
	parentLabel: string;
}

/** Throws InputError for bad input or an unknown parent (nothing written). */
export async function saveRevision(db: Kysely<Database>, opts: SaveRevisionOptions): Promise<SavedRevision> {
	const { input, sized } = sizeInput(opts.raw);
	const note = parseRevisionNote(opts.note);
	return db.transaction().execute(async (trx) => {
		const design = await designQueries.lockDesignById(trx, opts.designId);
		if (!design) throw new InputError([{ path: 'designId', value: opts.designId, message: 'no such design' }]);
		const parent = await designQueries.findRevisionByDesignAndLabel(trx, opts.designId, opts.parentLabel);
		if (!parent) throw new InputError([{ path: 'from', value: opts.parentLabel, message: 'must be the label of a revision of this design' }]);
		const seq = (await designQueries.findMaxRevisionSeqByDesign(trx, opts.designId)) + 1;
		const id = randomUUID();
		const label = revisionLabel(seq);
		await designQueries.insertRevision(trx, {
			id,
			design_id: opts.designId,
			label,
			seq,
			parent_id: parent.id,
			input: JSON.stringify(input),
			results: JSON.stringify(sized),
			note,
			created_by: opts.userId,
			...(opts.retunedFromMeasurementId ? { retuned_from_measurement_id: opts.retunedFromMeasurementId } : {}),
			...(opts.homedFromFieldCheckId ? { homed_from_field_check_id: opts.homedFromFieldCheckId } : {}),
			// none chosen (API, Homing): the built-in that can build the stack, recorded so the gate and the notes agree
			fab_profile: JSON.stringify(opts.fabProfile ?? builtInFabProfileFor(copperLayerCountOf(input)))
		});
		return { id, label, parentLabel: parent.label };
	});
}
