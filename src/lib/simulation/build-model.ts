// Artwork + stack → the full-wave model: materials, copper sheets, probe, lumped port, boundaries, mesh.
import type { Artwork } from '../artwork';
import type { FieldModel, FieldModelOptions } from './types';

/**
 * Builds the engine model of a two-copper artwork (patch and feed on top, ground below). The feed
 * is a lumped port of `referenceImpedanceOhm`: at the microstrip line's start from the line to the
 * ground (inset, edge and quarter-wave feeds), or at the probe's ground end across the clearance.
 */
export function buildFieldModel(artwork: Artwork, referenceImpedanceOhm: number, options: FieldModelOptions): FieldModel {
	void artwork;
	void referenceImpedanceOhm;
	void options;
	throw new Error('buildFieldModel: not built yet');
}
