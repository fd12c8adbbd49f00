// The FDTD mesh from the artwork's edges: thirds rule at metal edges, graded lines, λ/20 in the dielectric.
import type { MeshStatistics } from '../schemas/field-check';
import type { FieldMesh } from './types';

export interface MeshPlan {
	/** Largest cell anywhere, mm (λmin/20 in the dielectric at the band's top, scaled by the mode). */
	maxCellMm: number;
	/** Largest cell in air far from the board, mm. */
	maxAirCellMm: number;
	/** Largest neighbour-to-neighbour cell ratio (≤ 1.4). */
	gradingRatio: number;
	/** Cells through each dielectric layer (≥ 4). */
	cellsPerLayer: number;
}

export interface MeshFeatures {
	/** Metal edges along x and y: where copper ends. Each gets lines at −⅓·d and +⅔·d (metal inside). */
	edgesX: readonly { positionMm: number; metalBelow: boolean }[];
	edgesY: readonly { positionMm: number; metalBelow: boolean }[];
	/** Fixed lines (port, probe centre, board edges). */
	fixedX: readonly number[];
	fixedY: readonly number[];
	/** Layer interfaces along z, bottom to top, and the dielectric layers between them. */
	layersZ: readonly { fromMm: number; toMm: number }[];
	/** Domain extent (the absorbing boundaries' positions). */
	domain: { xMm: [number, number]; yMm: [number, number]; zMm: [number, number] };
}

/** Builds graded mesh lines for the features and plan. */
export function buildMesh(features: MeshFeatures, plan: MeshPlan): FieldMesh {
	void features;
	void plan;
	throw new Error('buildMesh: not built yet');
}

/** Cells, smallest and largest cell of a mesh (timesteps filled in by the runner). */
export function meshStatistics(mesh: FieldMesh, timesteps = 0): MeshStatistics {
	void mesh;
	void timesteps;
	throw new Error('meshStatistics: not built yet');
}
