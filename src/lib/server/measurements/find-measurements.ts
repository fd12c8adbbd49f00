// Reading measurements: a revision's list, one with its samples, and the retune links either way.
import type { Kysely } from 'kysely';
import type { TracePoint } from '../../formats/touchstone';
import type { ReflectionSample } from '../../schemas/reflection-sample';
import { analyzeMeasuredResponse } from '../../rf/measured-response';
import type { Database } from '../db/database';
import * as measurementQueries from '../db/measurement.queries';
import { toMeasurement, type Measurement, type MeasurementWithSamples } from './measurement-model';
import { traceOf } from './measurement-trace';

export async function listMeasurements(db: Kysely<Database>, revisionId: string): Promise<Measurement[]> {
	return (await measurementQueries.listMeasurementsByRevision(db, revisionId)).map(toMeasurement);
}

export async function findMeasurement(db: Kysely<Database>, revisionId: string, id: string): Promise<MeasurementWithSamples | null> {
	if (!/^[0-9a-f-]{36}$/.test(id)) return null;
	const row = await measurementQueries.findMeasurementByRevisionAndId(db, revisionId, id);
	return row ? { ...toMeasurement(row), samples: row.points as ReflectionSample[] } : null;
}

export interface MeasurementView extends Measurement {
	/** [frequencyHz, s11Db] pairs, at most 2 per plot column: what the page sends the browser instead of the samples. */
	trace: TracePoint[];
}

/**
 * One measurement as its page shows it: the stored plot trace, never the raw samples. A row stored before
 * traces were kept has its trace computed from its samples here.
 */
export async function findMeasurementView(db: Kysely<Database>, revisionId: string, id: string): Promise<MeasurementView | null> {
	if (!/^[0-9a-f-]{36}$/.test(id)) return null;
	const row = await measurementQueries.findMeasurementTraceByRevisionAndId(db, revisionId, id);
	if (!row) return null;
	let trace = row.trace as TracePoint[] | null;
	if (!trace) {
		const full = await findMeasurement(db, revisionId, id);
		if (!full) return null;
		trace = traceOf(analyzeMeasuredResponse(full.samples).points);
	}
	return { ...toMeasurement(row), trace };
}

export interface RetunedRevisionLink {
	label: string;
	createdAt: Date;
}

/** Revisions made by retuning from this measurement. */
export async function listRetunedRevisions(db: Kysely<Database>, measurementId: string): Promise<RetunedRevisionLink[]> {
	return (await measurementQueries.listRevisionsByRetunedFromMeasurement(db, measurementId)).map((r) => ({ label: r.label, createdAt: r.created_at }));
}

export interface RetuneSource {
	measurementId: string;
	fileName: string;
	uploadedAt: Date;
	/** Label of the revision the measured board was built from. */
	measuredLabel: string;
}

/** The measurement a revision was retuned from, or null for a revision saved by hand. */
export async function findRetuneSource(db: Kysely<Database>, revisionId: string): Promise<RetuneSource | null> {
	const row = await measurementQueries.findRetuneSourceByRevision(db, revisionId);
	return row ? { measurementId: row.measurement_id, fileName: row.file_name, uploadedAt: row.uploaded_at, measuredLabel: row.measured_label } : null;
}
