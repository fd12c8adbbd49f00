// Exact closest points between boundary pieces: point–segment, point–arc, segment–segment, segment–arc, arc–arc.
import type { Point } from '../geometry';
import type { BoundaryPiece } from './boundary-piece';

/** The two closest points, one on each piece, and their distance in mm (0 when the pieces cross or touch). */
export interface ClosestPair {
	readonly distanceMm: number;
	readonly onA: Point;
	readonly onB: Point;
}

type Arc = Extract<BoundaryPiece, { kind: 'arc' }>;
type Line = Extract<BoundaryPiece, { kind: 'line' }>;

/** Angles within 1e-12 rad of an arc's end still count as on the arc (round-off at shared end points). */
const ANGLE_SLACK_RAD = 1e-12;

const pair = (onA: Point, onB: Point): ClosestPair => ({ distanceMm: Math.hypot(onB[0] - onA[0], onB[1] - onA[1]), onA, onB });
const better = (a: ClosestPair, b: ClosestPair) => (b.distanceMm < a.distanceMm ? b : a);
const swap = (p: ClosestPair): ClosestPair => ({ distanceMm: p.distanceMm, onA: p.onB, onB: p.onA });

/** Whether the direction `angleRad` from the centre falls inside the arc's sweep. */
export function isAngleOnArc(arc: Arc, angleRad: number): boolean {
	const turn = 2 * Math.PI;
	let rel = (angleRad - arc.startRad) % turn;
	if (arc.sweepRad > 0) {
		if (rel < -ANGLE_SLACK_RAD) rel += turn;
		return rel <= arc.sweepRad + ANGLE_SLACK_RAD || rel >= turn - ANGLE_SLACK_RAD;
	}
	if (rel > ANGLE_SLACK_RAD) rel -= turn;
	return rel >= arc.sweepRad - ANGLE_SLACK_RAD || rel <= -turn + ANGLE_SLACK_RAD;
}

const pointAt = (arc: Arc, angleRad: number): Point => [arc.center[0] + arc.radiusMm * Math.cos(angleRad), arc.center[1] + arc.radiusMm * Math.sin(angleRad)];

/** Closest point of a segment to p: the foot of the perpendicular, clamped to the ends. */
export function closestOnSegment(p: Point, a: Point, b: Point): Point {
	const dx = b[0] - a[0];
	const dy = b[1] - a[1];
	const len2 = dx * dx + dy * dy;
	if (len2 === 0) return a;
	const t = Math.max(0, Math.min(1, ((p[0] - a[0]) * dx + (p[1] - a[1]) * dy) / len2));
	return [a[0] + t * dx, a[1] + t * dy];
}

/** Closest point of an arc to p: the radial projection when it lands on the arc, else the nearer end. */
export function closestOnArc(p: Point, arc: Arc): Point {
	const dx = p[0] - arc.center[0];
	const dy = p[1] - arc.center[1];
	if (dx === 0 && dy === 0) return arc.from; // the centre is equally far from every point
	const angle = Math.atan2(dy, dx);
	if (isAngleOnArc(arc, angle)) return pointAt(arc, angle);
	return Math.hypot(p[0] - arc.from[0], p[1] - arc.from[1]) <= Math.hypot(p[0] - arc.to[0], p[1] - arc.to[1]) ? arc.from : arc.to;
}

export function closestOnPiece(p: Point, piece: BoundaryPiece): Point {
	return piece.kind === 'line' ? closestOnSegment(p, piece.from, piece.to) : closestOnArc(p, piece);
}

function cross(o: Point, a: Point, b: Point): number {
	return (a[0] - o[0]) * (b[1] - o[1]) - (a[1] - o[1]) * (b[0] - o[0]);
}

function segmentSegment(a: Line, b: Line): ClosestPair {
	const [p, p2, q, q2] = [a.from, a.to, b.from, b.to];
	const d1 = cross(q, q2, p);
	const d2 = cross(q, q2, p2);
	const d3 = cross(p, p2, q);
	const d4 = cross(p, p2, q2);
	if (((d1 > 0 && d2 < 0) || (d1 < 0 && d2 > 0)) && ((d3 > 0 && d4 < 0) || (d3 < 0 && d4 > 0))) {
		const t = d1 / (d1 - d2); // proper crossing
		const x: Point = [p[0] + t * (p2[0] - p[0]), p[1] + t * (p2[1] - p[1])];
		return { distanceMm: 0, onA: x, onB: x };
	}
	// no proper crossing: the minimum is at an end point of one of them (touching gives 0 there too)
	let best = pair(p, closestOnSegment(p, q, q2));
	best = better(best, pair(p2, closestOnSegment(p2, q, q2)));
	best = better(best, pair(closestOnSegment(q, p, p2), q));
	best = better(best, pair(closestOnSegment(q2, p, p2), q2));
	return best;
}

function segmentArc(a: Line, arc: Arc): ClosestPair {
	const [p, p2] = [a.from, a.to];
	const dx = p2[0] - p[0];
	const dy = p2[1] - p[1];
	const len = Math.hypot(dx, dy);
	let best = better(pair(p, closestOnArc(p, arc)), pair(p2, closestOnArc(p2, arc)));
	best = better(best, pair(closestOnSegment(arc.from, p, p2), arc.from));
	best = better(best, pair(closestOnSegment(arc.to, p, p2), arc.to));
	if (len === 0) return best;
	// crossings of the segment with the circle: |p + t·d − c| = r
	const fx = p[0] - arc.center[0];
	const fy = p[1] - arc.center[1];
	const A = dx * dx + dy * dy;
	const B = 2 * (fx * dx + fy * dy);
	const C = fx * fx + fy * fy - arc.radiusMm * arc.radiusMm;
	const disc = B * B - 4 * A * C;
	if (disc >= 0) {
		const s = Math.sqrt(disc);
		for (const t of [(-B - s) / (2 * A), (-B + s) / (2 * A)]) {
			if (t < 0 || t > 1) continue;
			const x: Point = [p[0] + t * dx, p[1] + t * dy];
			if (isAngleOnArc(arc, Math.atan2(x[1] - arc.center[1], x[0] - arc.center[0]))) return { distanceMm: 0, onA: x, onB: x };
		}
	}
	// interior–interior minimum: where the circle's normal is perpendicular to the segment
	const nx = -dy / len;
	const ny = dx / len;
	for (const sgn of [1, -1]) {
		const angle = Math.atan2(sgn * ny, sgn * nx);
		if (!isAngleOnArc(arc, angle)) continue;
		const q = pointAt(arc, angle);
		best = better(best, pair(closestOnSegment(q, p, p2), q));
	}
	return best;
}

function arcArc(a: Arc, b: Arc): ClosestPair {
	let best = better(pair(a.from, closestOnArc(a.from, b)), pair(a.to, closestOnArc(a.to, b)));
	best = better(best, pair(closestOnArc(b.from, a), b.from));
	best = better(best, pair(closestOnArc(b.to, a), b.to));
	const ux = b.center[0] - a.center[0];
	const uy = b.center[1] - a.center[1];
	const d = Math.hypot(ux, uy);
	if (d === 0) return best; // concentric: every normal is radial and an end point reaches the minimum
	// crossings of the two circles (any geometry text: radical line construction)
	const l = (a.radiusMm * a.radiusMm - b.radiusMm * b.radiusMm + d * d) / (2 * d);
	const h2 = a.radiusMm * a.radiusMm - l * l;
	if (h2 >= 0) {
		const h = Math.sqrt(h2);
		const mx = a.center[0] + (l * ux) / d;
		const my = a.center[1] + (l * uy) / d;
		for (const sgn of [1, -1]) {
			const x: Point = [mx - (sgn * h * uy) / d, my + (sgn * h * ux) / d];
			const onA = isAngleOnArc(a, Math.atan2(x[1] - a.center[1], x[0] - a.center[0]));
			const onB = isAngleOnArc(b, Math.atan2(x[1] - b.center[1], x[0] - b.center[0]));
			if (onA && onB) return { distanceMm: 0, onA: x, onB: x };
		}
	}
	// interior–interior minima lie on the line through both centres
	const dirAB = Math.atan2(uy, ux);
	for (const angle of [dirAB, dirAB + Math.PI]) {
		if (isAngleOnArc(a, angle)) {
			const q = pointAt(a, angle);
			best = better(best, pair(q, closestOnArc(q, b)));
		}
		if (isAngleOnArc(b, angle)) {
			const q = pointAt(b, angle);
			best = better(best, pair(closestOnArc(q, a), q));
		}
	}
	return best;
}

/** Exact closest points between two boundary pieces. */
export function closestPair(a: BoundaryPiece, b: BoundaryPiece): ClosestPair {
	if (a.kind === 'line' && b.kind === 'line') return segmentSegment(a, b);
	if (a.kind === 'line' && b.kind === 'arc') return segmentArc(a, b);
	if (a.kind === 'arc' && b.kind === 'line') return swap(segmentArc(b, a));
	return arcArc(a as Arc, b as Arc);
}
