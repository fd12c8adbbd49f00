// What the revision page's Field check panel shows: the revision's checks, the chosen one with its result, the newest
// measurement as a trace (thinned for the page), the revision made from a Homing study, and where this revision came from.
import type { Kysely } from 'kysely';
import type { Database } from '../db/database';
import * as fieldCheckQueries from '../db/field-check.queries';
import * as measurementQueries from '../db/measurement.queries';
import type { Revision } from '../designs/design-model';
import { findMeasurement } from '../measurements/find-measurements';
import { toApiFieldCheckStatus, toApiFieldCheckSummary } from './field-check-view';
import { findFieldCheck, listFieldChecks } from './find-field-checks';

/** Samples of a measurement sent to the page at most; the plots thin further to what they draw. */
export const MAX_PAGE_SAMPLES = 2000;

interface Sample {
	frequencyHz: number;
	s11: { re: number; im: number };
}

/** Every k-th sample, the last one, and the one of least |S11| (the resonance survives). */
export function thinSamples(samples: readonly Sample[], max = MAX_PAGE_SAMPLES): Sample[] {
	if (samples.length <= max) return [...samples];
	const stride = Math.ceil(samples.length / (max - 2));
	let best = 0;
	for (let i = 1; i < samples.length; i++) {
		const m = samples[i].s11.re ** 2 + samples[i].s11.im ** 2;
		if (m < samples[best].s11.re ** 2 + samples[best].s11.im ** 2) best = i;
	}
	const keep: Sample[] = [];
	for (let i = 0; i < samples.length; i++) if (i % stride === 0 || i === best || i === samples.length - 1) keep.push(samples[i]);
	return keep;
}

export async function loadFieldCheckPanel(db: Kysely<Database>, revision: Revision, chosenId: string | null) {
	const checks = await listFieldChecks(db, revision.id);
	const selectedId = chosenId && checks.some((c) => c.id === chosenId) ? chosenId : checks[0]?.id;
	const selected = selectedId ? await findFieldCheck(db, selectedId) : null;
	const [newest] = await measurementQueries.listMeasurementsByRevision(db, revision.id);
	const measurement = newest ? await findMeasurement(db, revision.id, newest.id) : null;
	const homedInto = selected?.kind === 'homing' ? ((await fieldCheckQueries.listRevisionsByHomedFromFieldCheck(db, selected.id))[0]?.label ?? null) : null;
	const source = await fieldCheckQueries.findHomingSourceByRevision(db, revision.id);
	return {
		checks: checks.map(toApiFieldCheckSummary),
		selected: selected ? toApiFieldCheckStatus(selected) : null,
		measured: measurement ? { label: `measured (${measurement.fileName})`, samples: thinSamples(measurement.samples) } : null,
		homedInto,
		homedFrom: source ? { studyId: source.field_check_id, studiedLabel: source.studied_label } : null
	};
}
