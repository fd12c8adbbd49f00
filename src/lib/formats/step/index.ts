// STEP (ISO 10303-21, AP214) 3-D board writer: typed entities, then text.
export * from './commands';
export { buildStepBodies, buildStepDocument, drilledDiameterMm, STEP_CHORD_TOLERANCE_MM, STEP_COLOURS, STEP_HOLE_NOTE, type StepBody, type StepFace, type StepMaterial } from './build';
export { serializeStep, formatStepReal, encodeStepString, STEP_DECIMAL_PLACES } from './serialize';
import type { Artwork } from '../../artwork';
import type { ExportMeta } from '../export-meta';
import { buildStepDocument } from './build';
import { serializeStep } from './serialize';

/** The board as a STEP file (AP214, millimetres); `fileName` goes into the header's FILE_NAME. */
export function toStep(artwork: Artwork, meta: ExportMeta, fileName: string): string {
	return serializeStep(buildStepDocument(artwork, meta, fileName));
}
