// The full-wave model → the engine's XML (openEMS: <openEMS><FDTD/><ContinuousStructure/></openEMS>).
import type { FieldModel } from './types';

/** Serialises the model as the XML the engine reads; deterministic (fixed number formatting and order). */
export function serializeFieldModel(model: FieldModel): string {
	void model;
	throw new Error('serializeFieldModel: not built yet');
}
