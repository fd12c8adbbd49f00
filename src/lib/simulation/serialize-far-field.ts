// The far-field request → the XML the engine's far-field tool (`nf2ff`) reads.
import { formatNumber } from './serialize-model';

/** The far-field tool's result file (HDF5). */
export const FAR_FIELD_RESULT_FILE = 'farfield.h5';

export interface FarFieldRequest {
	frequencyHz: number;
	thetaDeg: readonly number[];
	phiDeg: readonly number[];
	/** The near-field dumps, E and H file of each face of the box. */
	planes: readonly { eFile: string; hFile: string }[];
	/** Output file name (default FAR_FIELD_RESULT_FILE). */
	outfile?: string;
}

const esc = (text: string) => text.replace(/&/g, '&amp;').replace(/"/g, '&quot;').replace(/</g, '&lt;');
const radians = (deg: readonly number[]) => deg.map((d) => formatNumber((d * Math.PI) / 180)).join(',');

/**
 * `<nf2ff Outfile freq><theta/><phi/><Planes E_Field H_Field/>…</nf2ff>`: θ and φ in radians,
 * the far field at the tool's default radius (1 m) about the origin. Deterministic.
 */
export function serializeFarFieldRequest(request: FarFieldRequest): string {
	if (request.planes.length === 0) throw new RangeError('far-field request: no near-field planes');
	return [
		'<?xml version="1.0" encoding="UTF-8"?>',
		`<nf2ff Outfile="${esc(request.outfile ?? FAR_FIELD_RESULT_FILE)}" freq="${formatNumber(request.frequencyHz)}">`,
		`  <theta>${radians(request.thetaDeg)}</theta>`,
		`  <phi>${radians(request.phiDeg)}</phi>`,
		...request.planes.map((p) => `  <Planes E_Field="${esc(p.eFile)}" H_Field="${esc(p.hFile)}"/>`),
		'</nf2ff>',
		''
	].join('\n');
}
