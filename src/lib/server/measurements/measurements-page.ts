// What a revision's measurements page shows: the list, the chosen file's trace and retune proposal, the full-wave check beside it.
import { predictedBand } from '../../design/predicted-band';
import { InputError } from '../../schemas';
import { can } from '../access';
import type { RequestIdentity } from '../auth/request-identity';
import { getDb } from '../db';
import { findLatestFieldCheckResult, thinSamples } from '../field-checks';
import { findMeasurement, findMeasurementView, findRetuneSource, listMeasurements, listRetunedRevisions } from './find-measurements';
import { MAX_TOUCHSTONE_BYTES } from './read-upload';
import { retuneProposal } from './retune-measurement';
import { requireRevision } from './revision-access';

/** The page's data for one revision; `chosenId` (the `m` query) picks the file, else the newest. 404/403 as requireRevision. */
export async function loadMeasurementsPage(identity: RequestIdentity, designId: string, label: string, chosenId: string | null) {
	const { design, revision, role } = await requireRevision(identity, designId, label, 'team.read');
	const db = getDb();
	const list = await listMeasurements(db, revision.id);
	const pickedId = chosenId ?? list[0]?.id;
	const chosen = pickedId ? await findMeasurementView(db, revision.id, pickedId) : null;
	const fullWave = chosen ? ((await findLatestFieldCheckResult(db, revision.id))?.result ?? null) : null;
	let selected = null;
	if (chosen) {
		let proposal = null;
		let proposalError: string | null = null;
		try {
			proposal = retuneProposal(revision, chosen);
		} catch (err) {
			if (!(err instanceof InputError)) throw err;
			proposalError = err.first.message;
		}
		const { trace, ...facts } = chosen;
		selected = {
			...facts,
			points: trace,
			// complex samples, thinned, only to draw against a full-wave check (the Smith chart needs S11 itself)
			samples: fullWave ? thinSamples((await findMeasurement(db, revision.id, chosen.id))?.samples ?? []) : [],
			proposal,
			proposalError,
			retunedInto: await listRetunedRevisions(db, chosen.id)
		};
	}
	return {
		design: { id: design.id, name: design.name, slug: design.slug },
		revision: { label: revision.label, frequencyHz: revision.results.frequencyHz, parentLabel: revision.parentLabel },
		predictedBand: predictedBand(revision.results),
		list,
		selected,
		retunedFrom: await findRetuneSource(db, revision.id),
		fullWave,
		canUpload: can(role, 'measurement.upload'),
		canRetune: can(role, 'revision.create'),
		canDelete: can(role, 'measurement.delete'),
		maxBytes: MAX_TOUCHSTONE_BYTES
	};
}
