// Deleting a measurement (editors and owners): the row goes, and the team's security log says who deleted which file of which revision.
import type { Kysely } from 'kysely';
import { recordAuditEvent } from '../audit/record-audit-event';
import type { Database } from '../db/database';
import * as measurementQueries from '../db/measurement.queries';
import type { Design, Revision } from '../designs/design-model';
import { toMeasurement } from './measurement-model';

/** The measurement is the recorded source of retuned revisions (which are immutable): it stays. */
export class MeasurementInUseError extends Error {
	constructor(
		readonly fileName: string,
		readonly retunedLabels: readonly string[]
	) {
		super(`${fileName} is kept: revision${retunedLabels.length === 1 ? '' : 's'} ${retunedLabels.join(', ')} ${retunedLabels.length === 1 ? 'was' : 'were'} retuned from it and name${retunedLabels.length === 1 ? 's' : ''} it in ${retunedLabels.length === 1 ? 'its' : 'their'} history`);
		this.name = 'MeasurementInUseError';
	}
}

export interface DeleteMeasurementOptions {
	design: Design;
	revision: Revision;
	measurementId: string;
	/** Who deletes (the caller has been authorised for 'measurement.delete'). */
	userId: string;
}

/**
 * Deletes the measurement and records `measurement.deleted` in one transaction. Returns false when the
 * revision has no such measurement (nothing written); throws MeasurementInUseError when a revision was
 * retuned from it.
 */
export async function deleteMeasurement(db: Kysely<Database>, opts: DeleteMeasurementOptions): Promise<boolean> {
	return db.transaction().execute(async (trx) => {
		if (!/^[0-9a-f-]{36}$/.test(opts.measurementId)) return false;
		// The list columns only: the samples of a long sweep are megabytes the deletion never needs.
		const row = await measurementQueries.findMeasurementTraceByRevisionAndId(trx, opts.revision.id, opts.measurementId);
		if (!row) return false;
		const measurement = toMeasurement(row);
		const retuned = await measurementQueries.listRevisionsByRetunedFromMeasurement(trx, measurement.id);
		if (retuned.length > 0) throw new MeasurementInUseError(measurement.fileName, retuned.map((r) => r.label));
		if ((await measurementQueries.deleteMeasurementByRevisionAndId(trx, opts.revision.id, measurement.id)) === 0) return false;
		await recordAuditEvent(
			{
				kind: 'measurement.deleted',
				teamId: opts.design.teamId,
				actorUserId: opts.userId,
				details: {
					measurementId: measurement.id,
					designId: opts.design.id,
					designName: opts.design.name,
					revisionLabel: opts.revision.label,
					fileName: measurement.fileName,
					fileSha256: measurement.fileSha256,
					uploadedBy: measurement.uploadedByName
				}
			},
			trx
		);
		return true;
	});
}
