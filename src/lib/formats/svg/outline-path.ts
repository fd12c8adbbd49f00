// The board outline and the copper outlines as one SVG path `d` string in mm (y flipped as in the drawing), for pasting.
import type { Artwork, ArtworkShape } from '../../artwork';
import { arcSweepRad, type Contour, type Point } from '../../geometry';
import { svgNumber } from './svg-number';

/** Path data of a closed contour on a board of length `boardLengthMm`: svgY = boardLength − y, arcs as SVG arcs. */
export function contourPathData(c: Contour, boardLengthMm: number): string {
	const at = (p: Point) => `${svgNumber(p[0])} ${svgNumber(boardLengthMm - p[1])}`;
	let d = `M${at(c.start)}`;
	let from = c.start;
	for (const s of c.segments) {
		if (s.kind === 'line') d += `L${at(s.to)}`;
		else {
			const r = Math.hypot(from[0] - s.center[0], from[1] - s.center[1]);
			const large = Math.abs(arcSweepRad(from, s.to, s.center, s.clockwise)) > Math.PI ? 1 : 0;
			// flipping y turns counter-clockwise into SVG's positive-angle (sweep-flag 0) direction
			d += `A${svgNumber(r)} ${svgNumber(r)} 0 ${large} ${s.clockwise ? 1 : 0} ${at(s.to)}`;
		}
		from = s.to;
	}
	return d + 'Z';
}

/** A circle as two half-turn arcs (SVG 1.1 §8.3.8: one arc cannot close on its own start). */
function circlePathData(center: Point, radiusMm: number, boardLengthMm: number): string {
	const y = svgNumber(boardLengthMm - center[1]);
	const r = svgNumber(radiusMm);
	return `M${svgNumber(center[0] - radiusMm)} ${y}A${r} ${r} 0 1 0 ${svgNumber(center[0] + radiusMm)} ${y}A${r} ${r} 0 1 0 ${svgNumber(center[0] - radiusMm)} ${y}Z`;
}

function shapePathData(s: ArtworkShape, boardLengthMm: number): string {
	const g = s.geometry;
	if (g.kind === 'circle') return circlePathData(g.center, g.diameterMm / 2, boardLengthMm);
	if (g.kind === 'outline') return contourPathData(g.contour, boardLengthMm);
	// an open pen stroke (legend lettering) as its centre line
	if (g.kind === 'stroke') return g.points.map((p, i) => `${i === 0 ? 'M' : 'L'}${svgNumber(p[0])} ${svgNumber(boardLengthMm - p[1])}`).join('');
	return [g.region.outer, ...g.region.holes].map((c) => contourPathData(c, boardLengthMm)).join('');
}

/**
 * The board profile, then every copper shape but the ground planes (which fill the board) on every copper layer from
 * the top down, as one path: subpaths in mm, origin at the board's upper-left corner, y down (the SVG drawing's frame).
 */
export function outlinePathData(artwork: Artwork): string {
	const L = artwork.board.lengthMm;
	const parts: string[] = [];
	for (const layer of artwork.layers) if (layer.function.kind === 'profile') for (const s of layer.shapes) parts.push(shapePathData(s, L));
	const coppers = artwork.layers.filter((l) => l.function.kind === 'copper');
	for (const layer of coppers) for (const s of layer.shapes) if (s.polarity === 'dark' && s.role !== 'ground') parts.push(shapePathData(s, L));
	return parts.join('');
}
