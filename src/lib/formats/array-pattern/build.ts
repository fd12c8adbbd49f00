// Sized array → the array-pattern document (plot-ready cuts and the figures), and its bytes.
import type { SizedDesign } from '../../rf';
import { SOFTWARE_NAME, type ExportMeta } from '../export-meta';

export const ARRAY_PATTERN_FORMAT = 'fringefield-array-pattern';
export const ARRAY_PATTERN_FORMAT_VERSION = 1;

export interface ArrayPatternDocument {
	readonly format: typeof ARRAY_PATTERN_FORMAT;
	readonly formatVersion: typeof ARRAY_PATTERN_FORMAT_VERSION;
	readonly design: { name: string; slug: string; revision: string; revisionDate: string; software: string };
	readonly frequencyHz: number;
	readonly columns: number;
	readonly rows: number;
	readonly spacingXWavelengths: number;
	readonly spacingYWavelengths: number;
	readonly scanAngleDeg: number;
	readonly gratingLobeLimitWavelengths: number;
	readonly arrayFactorDirectivityDbi: number;
	readonly gainDbi: number;
	/** The terms of gainDbi: element gain + 10·log10 N − feed-line loss − mismatch loss (dB). */
	readonly gainBreakdown?: { elementGainDbi: number; arrayGainDb: number; feedLossDb: number; mismatchLossDb: number };
	readonly halfPowerBeamwidthXzDeg: number | null;
	readonly halfPowerBeamwidthYzDeg: number | null;
	/** What the numbers are: isotropic elements, no coupling, no feed loss. */
	readonly note: string;
	/** xz: the scan plane (φ = 0); yz: the plane across it through the beam. Normalised power, dB. */
	readonly pattern: { anglesDeg: number[]; xzDb: number[]; yzDb: number[] };
}

/** The note of revisions sized before the gain budget: kept word for word, so their files export byte for byte as before. */
const NOTE_BEFORE_GAIN_BUDGET = 'Array factor of isotropic elements; gain = element gain estimate + 10·log10(element count), without mutual coupling or feed-network loss. Estimates, not measurements.';
const GAIN_BUDGET_NOTE =
	"Array factor of isotropic elements; gain = element gain estimate + 10·log10(element count) − the corporate feed's line loss (conductor + dielectric along the routed path) − the mismatch loss at the port (gainBreakdown), without mutual coupling. Estimates, not measurements.";

/** The document, or null for a design that is not an array. */
export function buildArrayPatternDocument(sized: SizedDesign, meta: ExportMeta): ArrayPatternDocument | null {
	const a = sized.array;
	if (!a) return null;
	return {
		format: ARRAY_PATTERN_FORMAT,
		formatVersion: ARRAY_PATTERN_FORMAT_VERSION,
		design: { name: meta.designName, slug: meta.designSlug, revision: meta.revisionLabel, revisionDate: meta.revisionDate, software: `${SOFTWARE_NAME} ${meta.softwareVersion}` },
		frequencyHz: sized.frequencyHz,
		columns: a.columns,
		rows: a.rows,
		spacingXWavelengths: a.spacingXWavelengths,
		spacingYWavelengths: a.spacingYWavelengths,
		scanAngleDeg: a.scanAngleDeg,
		gratingLobeLimitWavelengths: a.gratingLobeLimitWavelengths,
		arrayFactorDirectivityDbi: a.factor.arrayFactorDirectivityDbi,
		gainDbi: a.factor.gainDbi,
		// absent (and so left out of the JSON) in revisions sized before the gain budget
		gainBreakdown: a.factor.gainBreakdown as ArrayPatternDocument['gainBreakdown'] | undefined,
		halfPowerBeamwidthXzDeg: a.factor.halfPowerBeamwidthXzDeg,
		halfPowerBeamwidthYzDeg: a.factor.halfPowerBeamwidthYzDeg,
		note: a.factor.gainBreakdown ? GAIN_BUDGET_NOTE : NOTE_BEFORE_GAIN_BUDGET,
		pattern: a.factor.pattern
	};
}

/** Compact JSON with a final newline. */
export function serializeArrayPattern(doc: ArrayPatternDocument): string {
	return JSON.stringify(doc) + '\n';
}
