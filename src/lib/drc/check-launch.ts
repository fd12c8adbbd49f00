// The connector launch's own rules: ground pads and flange holes kept from the line's copper, vias kept from the edge, from each other and inside their pads, the launch inside the board.
import { LENGTH_EPSILON_MM, contourBounds, distanceMm, type Point } from '../geometry';
import type { Artwork, ArtworkDrill, ArtworkShape } from '../artwork';
import type { FabProfile } from '../schemas/fab-profile';
import { boundaryPieces } from './boundary-piece';
import { isPointInShape } from './point-in-shape';
import { boundaryDistance } from './shape-distance';
import { locationOf, midpointOf, roundMm, type Violation } from './violation';

const LAUNCH_ROLES: readonly ArtworkShape['role'][] = ['launch-signal', 'launch-ground', 'launch-back-pad'];
const isLaunchDrill = (d: ArtworkDrill) => d.role === 'launch-via' || d.role === 'launch-flange';

/** Shortest distance from p to the shape's boundary; 0 (and inside true) when p is within the copper. */
function pointToShape(p: Point, shape: ArtworkShape): { distanceMm: number; inside: boolean; at: Point } {
	const pieces = boundaryPieces(shape);
	const dot = boundaryPieces({ id: 'p', role: 'ground', polarity: 'dark', geometry: { kind: 'circle', center: p, diameterMm: 1e-9 } });
	const gap = boundaryDistance(dot, pieces);
	return { distanceMm: gap ? gap.distanceMm : Infinity, inside: isPointInShape(p, pieces), at: gap ? gap.onB : p };
}

/**
 * launch-gap: each top ground pad of an edge launch keeps minSpacingMm from every other copper of its
 * layer but the ground (the line, its signal pad, the patch); a pad touching or overlapping that copper
 * measures 0. Each plated flange hole of a back-side launch keeps minSpacingMm (hole wall to copper) from
 * every non-ground copper it passes (the patch on the top copper).
 */
export function checkLaunchGap(artwork: Artwork, profile: FabProfile): Violation[] {
	const out: Violation[] = [];
	const required = profile.minSpacingMm;
	for (const layer of artwork.layers) {
		if (layer.function.kind !== 'copper') continue;
		const signal = layer.shapes.filter((s) => s.polarity === 'dark' && s.geometry.kind !== 'outline' && s.role !== 'ground' && s.role !== 'launch-ground' && s.role !== 'launch-back-pad');
		for (const pad of layer.shapes.filter((s) => s.role === 'launch-ground')) {
			const padPieces = boundaryPieces(pad);
			for (const other of signal) {
				const otherPieces = boundaryPieces(other);
				const gap = boundaryDistance(padPieces, otherPieces);
				if (!gap) continue;
				const overlapping = isPointInShape(otherPieces[0].from, padPieces) || isPointInShape(padPieces[0].from, otherPieces);
				const measured = overlapping ? 0 : gap.distanceMm;
				if (!(measured < required - LENGTH_EPSILON_MM)) continue;
				out.push({
					ruleId: 'launch-gap',
					layerId: layer.id,
					shapeIds: [pad.id, other.id],
					location: locationOf(midpointOf(gap.onA, gap.onB)),
					measuredMm: roundMm(measured),
					requiredMm: required,
					message: `${pad.id} is ${measured === 0 ? 'touching' : `${roundMm(measured)} mm from`} ${other.id}; ${profile.name} needs at least ${required} mm between a launch ground pad and the line's copper`
				});
			}
		}
		const index = layer.function.copperIndex;
		for (const hole of artwork.drills.filter((d) => d.role === 'launch-flange' && index >= d.fromCopper && index <= d.toCopper)) {
			for (const other of signal) {
				const near = pointToShape(hole.center, other);
				const measured = near.inside ? 0 : Math.max(0, near.distanceMm - hole.diameterMm / 2);
				if (!(measured < required - LENGTH_EPSILON_MM)) continue;
				out.push({
					ruleId: 'launch-gap',
					layerId: layer.id,
					shapeIds: [hole.id, other.id],
					location: locationOf(hole.center),
					measuredMm: roundMm(measured),
					requiredMm: required,
					message: `${hole.id} ${near.inside ? 'passes through' : `is ${roundMm(measured)} mm from`} ${other.id}; ${profile.name} needs at least ${required} mm between a plated flange hole and other copper`
				});
			}
		}
	}
	return out;
}

/** launch-via-edge: a launch hole's wall keeps copperToEdgeMm from every side of the board outline. */
export function checkLaunchViaEdge(artwork: Artwork, profile: FabProfile): Violation[] {
	const { widthMm: w, lengthMm: l } = artwork.board;
	return artwork.drills.filter(isLaunchDrill).flatMap((d): Violation[] => {
		const [x, y] = d.center;
		const r = d.diameterMm / 2;
		const sides: [string, number][] = [['left', x - r], ['bottom', y - r], ['right', w - x - r], ['top', l - y - r]];
		const [side, measured] = sides.reduce((a, b) => (b[1] < a[1] ? b : a));
		if (!(measured < profile.copperToEdgeMm - LENGTH_EPSILON_MM)) return [];
		return [
			{
				ruleId: 'launch-via-edge',
				layerId: null,
				shapeIds: [d.id],
				location: locationOf(d.center),
				measuredMm: roundMm(measured),
				requiredMm: profile.copperToEdgeMm,
				message: `${d.id}'s wall is ${roundMm(measured)} mm from the ${side} board edge; ${profile.name} keeps holes ${profile.copperToEdgeMm} mm from the edge`
			}
		];
	});
}

/** launch-via-spacing: the web between two launch holes (centre distance less both radii) is at least minSpacingMm. */
export function checkLaunchViaSpacing(artwork: Artwork, profile: FabProfile): Violation[] {
	const holes = artwork.drills.filter(isLaunchDrill);
	const out: Violation[] = [];
	for (let i = 0; i < holes.length; i++) {
		for (let j = i + 1; j < holes.length; j++) {
			const a = holes[i];
			const b = holes[j];
			const web = distanceMm(a.center, b.center) - a.diameterMm / 2 - b.diameterMm / 2;
			if (!(web < profile.minSpacingMm - LENGTH_EPSILON_MM)) continue;
			out.push({
				ruleId: 'launch-via-spacing',
				layerId: null,
				shapeIds: [a.id, b.id],
				location: locationOf(midpointOf(a.center, b.center)),
				measuredMm: roundMm(web),
				requiredMm: profile.minSpacingMm,
				message: `${a.id} and ${b.id} leave ${roundMm(web)} mm between their walls; ${profile.name} needs at least ${profile.minSpacingMm} mm`
			});
		}
	}
	return out;
}

/**
 * launch-annular-ring: each edge-launch via lies in a top ground pad with at least minAnnularRingMm of
 * copper between its wall and the pad's nearest edge; a via in no pad measures its own −radius.
 */
export function checkLaunchAnnularRing(artwork: Artwork, profile: FabProfile): Violation[] {
	const top = artwork.layers.find((l) => l.function.kind === 'copper' && l.function.copperIndex === 1);
	const pads = top ? top.shapes.filter((s) => s.role === 'launch-ground') : [];
	return artwork.drills
		.filter((d) => d.role === 'launch-via')
		.flatMap((d): Violation[] => {
			const r = d.diameterMm / 2;
			const holders = pads.map((p) => ({ pad: p, near: pointToShape(d.center, p) })).filter((h) => h.near.inside);
			const best = holders.reduce<{ ring: number; pad: ArtworkShape | null }>((a, h) => (h.near.distanceMm - r > a.ring ? { ring: h.near.distanceMm - r, pad: h.pad } : a), { ring: -r, pad: null });
			if (!(best.ring < profile.minAnnularRingMm - LENGTH_EPSILON_MM)) return [];
			return [
				{
					ruleId: 'launch-annular-ring',
					layerId: top?.id ?? null,
					shapeIds: best.pad ? [best.pad.id, d.id] : [d.id],
					location: locationOf(d.center),
					measuredMm: roundMm(best.ring),
					requiredMm: profile.minAnnularRingMm,
					message: best.pad
						? `${d.id} leaves ${roundMm(best.ring)} mm of ${best.pad.id} between its wall and the pad's edge; ${profile.name} needs an annular ring of at least ${profile.minAnnularRingMm} mm`
						: `${d.id} lies in no launch ground pad; ${profile.name} needs an annular ring of at least ${profile.minAnnularRingMm} mm`
				}
			];
		});
}

/** launch-outside-board: every launch pad and hole centre lies on the board (0, 0)–(width, length); measured is how far inside (negative: outside). */
export function checkLaunchInsideBoard(artwork: Artwork): Violation[] {
	const { widthMm: w, lengthMm: l } = artwork.board;
	const out: Violation[] = [];
	const judge = (id: string, layerId: string | null, minX: number, minY: number, maxX: number, maxY: number, at: Point) => {
		const inside = Math.min(minX, minY, w - maxX, l - maxY);
		if (!(inside < -LENGTH_EPSILON_MM)) return;
		out.push({
			ruleId: 'launch-outside-board',
			layerId,
			shapeIds: [id],
			location: locationOf(at),
			measuredMm: roundMm(inside),
			requiredMm: 0,
			message: `${id} runs ${roundMm(-inside)} mm off the board; the launch must lie on the board`
		});
	};
	for (const layer of artwork.layers) {
		if (layer.function.kind !== 'copper') continue;
		for (const s of layer.shapes) {
			if (!LAUNCH_ROLES.includes(s.role) || s.geometry.kind !== 'region') continue;
			const b = contourBounds(s.geometry.region.outer);
			judge(s.id, layer.id, b.minXMm, b.minYMm, b.maxXMm, b.maxYMm, [(b.minXMm + b.maxXMm) / 2, (b.minYMm + b.maxYMm) / 2]);
		}
	}
	for (const d of artwork.drills.filter(isLaunchDrill)) judge(d.id, null, d.center[0], d.center[1], d.center[0], d.center[1], d.center);
	return out;
}

/** Every launch rule, in a fixed order; empty for an artwork without a launch. */
export function checkLaunch(artwork: Artwork, profile: FabProfile): Violation[] {
	return [...checkLaunchInsideBoard(artwork), ...checkLaunchGap(artwork, profile), ...checkLaunchViaEdge(artwork, profile), ...checkLaunchViaSpacing(artwork, profile), ...checkLaunchAnnularRing(artwork, profile)];
}
