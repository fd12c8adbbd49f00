// A measurement as the app sees it: camelCase, parsed json, one mapping.
import type { MatchedBand, MeasuredResonance } from '../../rf/measured-response';
import type { DataFormat, FrequencyUnit, PortCount, TouchstoneVersion } from '../../formats/touchstone';
import type { ReflectionSample } from '../../schemas/reflection-sample';

/** What the stored file says, computed once at upload. */
export interface MeasurementSummary {
	file: {
		version: TouchstoneVersion;
		portCount: PortCount;
		frequencyUnit: FrequencyUnit;
		format: DataFormat;
		referenceImpedanceOhm: number[];
		pointCount: number;
		startHz: number;
		stopHz: number;
	};
	resonance: MeasuredResonance;
	band: MatchedBand;
	/** null when every sample reflects all power (VSWR infinite; JSON has no Infinity). */
	minimumVswr: number | null;
	minimumVswrFrequencyHz: number;
}

export interface Measurement {
	id: string;
	revisionId: string;
	fileName: string;
	fileSha256: string;
	summary: MeasurementSummary;
	uploadedBy: string;
	uploadedByName: string;
	uploadedAt: Date;
}

export interface MeasurementWithSamples extends Measurement {
	samples: ReflectionSample[];
}

export interface MeasurementListRecord {
	id: string;
	revision_id: string;
	file_name: string;
	file_sha256: string;
	summary: unknown;
	uploaded_by: string;
	uploaded_at: Date;
	uploaded_by_name: string;
}

export function toMeasurement(row: MeasurementListRecord): Measurement {
	return {
		id: row.id,
		revisionId: row.revision_id,
		fileName: row.file_name,
		fileSha256: row.file_sha256,
		summary: row.summary as MeasurementSummary,
		uploadedBy: row.uploaded_by,
		uploadedByName: row.uploaded_by_name,
		uploadedAt: row.uploaded_at
	};
}
