// The board profile layer: the outline drawn with a thin round pen, the same for every kind of board.
import type { Contour } from '../geometry';
import type { ArtworkLayer } from './types';

/** Pen width of the profile outline (a drawing convention; the fab routes the centre line). */
export const PROFILE_STROKE_WIDTH_MM = 0.1;

export function profileLayer(outline: Contour): ArtworkLayer {
	return {
		id: 'profile',
		title: 'Board profile',
		function: { kind: 'profile' },
		shapes: [{ id: 'profile', role: 'profile', polarity: 'dark', geometry: { kind: 'outline', contour: outline, strokeWidthMm: PROFILE_STROKE_WIDTH_MM } }],
		voids: []
	};
}
