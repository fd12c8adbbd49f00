// The full-wave model as plain typed data: what the model writer builds and the XML serialiser writes.
import type { FieldCheckMode } from '../schemas/field-check';

/** One axis of the rectilinear FDTD mesh: strictly increasing line positions in mm. */
export type MeshLinesMm = readonly number[];

export interface FieldMesh {
	readonly xMm: MeshLinesMm;
	readonly yMm: MeshLinesMm;
	readonly zMm: MeshLinesMm;
}

/** An axis-aligned box (a sheet when one extent is zero), corners in mm. */
export interface ModelBox {
	readonly kind: 'box';
	readonly fromMm: readonly [x: number, y: number, z: number];
	readonly toMm: readonly [x: number, y: number, z: number];
	/** Higher priority wins where primitives overlap (copper 10 over dielectric 0). */
	readonly priority: number;
}

/** A flat polygon in the plane z = zMm (extruded by thicknessMm when above zero). */
export interface ModelPolygon {
	readonly kind: 'polygon';
	readonly zMm: number;
	readonly thicknessMm: number;
	readonly pointsMm: readonly (readonly [x: number, y: number])[];
	readonly priority: number;
}

/** A solid circular cylinder along z. */
export interface ModelCylinder {
	readonly kind: 'cylinder';
	readonly centerMm: readonly [x: number, y: number];
	readonly fromZMm: number;
	readonly toZMm: number;
	readonly radiusMm: number;
	readonly priority: number;
}

/** A cylindrical shell (a plated barrel) along z. */
export interface ModelCylindricalShell {
	readonly kind: 'cylindrical-shell';
	readonly centerMm: readonly [x: number, y: number];
	readonly fromZMm: number;
	readonly toZMm: number;
	/** Radius of the wall's mid-surface. */
	readonly radiusMm: number;
	readonly wallMm: number;
	readonly priority: number;
}

export type ModelPrimitive = ModelBox | ModelPolygon | ModelCylinder | ModelCylindricalShell;

/**
 * One property of the model with its primitives.
 * - `dielectric`: εr and the conductivity κ (S/m) that gives the stated tanδ at one frequency:
 *   κ = 2π·f·ε0·εr·tanδ (exact at that frequency only; the model states which).
 * - `sheet`: a zero-thickness conducting sheet of the copper's conductivity and thickness.
 * - `pec`: a perfect conductor (the probe's wire, a connector launch's posts).
 */
export type ModelProperty =
	| { readonly kind: 'dielectric'; readonly name: string; readonly relativePermittivity: number; readonly conductivitySPerM: number; readonly primitives: readonly ModelPrimitive[] }
	| { readonly kind: 'sheet'; readonly name: string; readonly conductivitySPerM: number; readonly thicknessMm: number; readonly primitives: readonly ModelPrimitive[] }
	| { readonly kind: 'pec'; readonly name: string; readonly primitives: readonly ModelPrimitive[] };

/**
 * The lumped port: a resistor of the reference impedance and a voltage source across the gap from
 * `fromMm` (ground side) to `toMm` (signal side) along z, with the voltage probe along the gap and
 * the current probe across its middle. The engine writes `port_ut1` and `port_it1`.
 */
export interface ModelPort {
	readonly fromMm: readonly [x: number, y: number, z: number];
	readonly toMm: readonly [x: number, y: number, z: number];
	readonly referenceImpedanceOhm: number;
}

/**
 * The near-field box for the far-field transform: the engine records the E and H phasors at
 * `frequenciesHz` (a running DFT during the run) on the box's six faces, one HDF5 file per face;
 * the far-field transform then integrates them. The box lies in air, around the whole board.
 */
export interface ModelNearFieldBox {
	readonly fromMm: readonly [x: number, y: number, z: number];
	readonly toMm: readonly [x: number, y: number, z: number];
	/** Frequencies of the recorded phasors (the target). */
	readonly frequenciesHz: readonly number[];
}

/** Everything the engine needs for one Field check run. */
export interface FieldModel {
	readonly mode: FieldCheckMode;
	/** Mesh refinement over the mode's base (1, or 1.5 for the refined run of accurate mode). */
	readonly refinement: number;
	readonly targetFrequencyHz: number;
	/** The check band the Gaussian excitation spans: target ± bandFraction. */
	readonly band: { readonly lowHz: number; readonly highHz: number };
	/** Gaussian excitation: centre f0 and 20 dB half-bandwidth fc (the engine's Type 0). */
	readonly excitation: { readonly centerHz: number; readonly cutoffHz: number };
	/** Frequency at which tanδ was turned into a conductivity (the target). */
	readonly lossReferenceHz: number;
	/** Absorbing boundary on all six faces. */
	readonly boundary: 'MUR' | 'PML_8';
	/** Stop when the field energy has fallen this far below its peak, dB (END_CRITERION_DB, −35). */
	readonly endCriterionDb: number;
	readonly maxTimesteps: number;
	readonly mesh: FieldMesh;
	readonly properties: readonly ModelProperty[];
	readonly port: ModelPort;
	readonly nearFieldBox: ModelNearFieldBox | null;
}

export interface FieldModelOptions {
	mode: FieldCheckMode;
	/** Extra mesh refinement factor (default 1). */
	refinement?: number;
	/** Record the near-field box at the target frequency for the far-field transform (default true). */
	nearFarField?: boolean;
}

/** A sampled port time series as the engine writes it (seconds, volts or amperes). */
export interface PortSeries {
	readonly timeS: readonly number[];
	readonly values: readonly number[];
}
