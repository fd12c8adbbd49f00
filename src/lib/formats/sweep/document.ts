// The sweep document's TypeScript shape (version 2); its JSON Schema is generated from src/lib/schemas/sweep-point.ts.
// Version 1 documents (no solver set-up, a base with every default) stay valid against /schemas/sweep-v1.json.
import type { ArtworkDrill, ArtworkLayer, ArtworkProbe, StackLayer } from '../../artwork';
import type { DesignInputDocument } from '../../schemas';
import type { SizedDesign } from '../../rf';
import type { SweepPlan } from './plan';
import type { SolverSetup } from './solver-setup';

export const SWEEP_FORMAT = 'fringefield-sweep';
/** The version every writer writes (CLI, API, downloads). */
export const SWEEP_FORMAT_VERSION = 2;
/** Where the app publishes the schema of the version written (route src/routes/schemas/sweep-v2.json). */
export const SWEEP_SCHEMA_PATH = '/schemas/sweep-v2.json';
/** Where the app keeps publishing the version-1 schema, so version-1 documents stay readable. */
export const SWEEP_V1_SCHEMA_PATH = '/schemas/sweep-v1.json';

export type SweepDerived = Omit<SizedDesign, 'input' | 'warnings'>;

/** What conducts in the probe hole, at the end of a point's stack: it spans the whole stack (not a slab). */
export interface SweepProbeEntry extends ArtworkProbe {
	readonly kind: 'probe';
	readonly id: string;
	readonly center: readonly [number, number];
	readonly zMm: number;
	readonly thicknessMm: number;
}

export type SweepPoint =
	| {
			readonly index: number;
			readonly status: 'sized';
			/** The swept fields' values at this point, keyed by dotted path. */
			readonly parameters: Readonly<Record<string, number>>;
			readonly derived: SweepDerived;
			readonly warnings: readonly { code: string; message: string }[];
			readonly board: { widthMm: number; lengthMm: number };
			readonly layers: readonly ArtworkLayer[];
			readonly drills: readonly ArtworkDrill[];
			/** The slabs bottom up (z increasing from 0 at the bottom copper's lower face), then (when the design states a probe model) the probe entry. */
			readonly stack: readonly (StackLayer | SweepProbeEntry)[];
			/** Ports, frequency window, the frequency the materials hold at, and the dielectric outline. */
			readonly solverSetup: SolverSetup;
	  }
	| {
			readonly index: number;
			readonly status: 'refused';
			readonly parameters: Readonly<Record<string, number>>;
			/** Why this point has no design: bad input for sizing, or a broken geometry rule. */
			readonly error: { kind: 'input' | 'geometry'; path: string; message: string };
	  };

export interface SweepDocument {
	readonly $schema: string;
	readonly format: typeof SWEEP_FORMAT;
	readonly formatVersion: typeof SWEEP_FORMAT_VERSION;
	readonly design: { name: string; slug: string; revision: string; revisionDate: string; software: string };
	/** The revision's design input with only the fields that apply to its shape and feed (see applicableInput). */
	readonly base: DesignInputDocument;
	readonly plan: SweepPlan;
	readonly pointCount: number;
	readonly points: readonly SweepPoint[];
}

