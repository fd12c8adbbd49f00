// "Make a revision from the tuned input": a new revision (child of the studied one) from a Homing study's tuned
// design input, with a note naming the study; the revision records the study's id at insert.
import type { Kysely } from 'kysely';
import { InputError } from '../../schemas';
import type { Database } from '../db/database';
import type { Design } from '../designs/design-model';
import { saveRevision } from '../designs/save-revision';
import type { FieldCheckWithResult } from './field-check-model';

export async function reviseFromHoming(db: Kysely<Database>, opts: { design: Design; study: FieldCheckWithResult; userId: string }): Promise<{ label: string }> {
	const { study } = opts;
	if (study.kind !== 'homing' || study.state !== 'succeeded' || !study.homing) {
		throw new InputError([{ path: 'studyId', value: study.id, message: 'must be a Homing study that has finished' }]);
	}
	const note = `Tuned by Homing study ${study.id.slice(0, 8)} of rev ${study.revisionLabel}: ${study.homing.stoppedBecause}`.slice(0, 500);
	const saved = await saveRevision(db, { designId: opts.design.id, parentLabel: study.revisionLabel, userId: opts.userId, raw: study.homing.tunedInput, note, homedFromFieldCheckId: study.id });
	return { label: saved.label };
}
