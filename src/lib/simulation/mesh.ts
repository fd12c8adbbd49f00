// The FDTD mesh from the artwork's edges: thirds rule at metal edges, graded lines, λ/20 in the dielectric.
import type { MeshStatistics } from '../schemas/field-check';
import type { FieldMesh } from './types';

/** Largest ratio of neighbouring cells the grader aims at; the rule it must keep is MAX_GRADING_RATIO. */
const TARGET_GRADING_RATIO = 1.25;
/** Neighbouring cells may differ by at most this factor (common practice for FDTD meshes, no source). */
export const MAX_GRADING_RATIO = 1.4;
/** Samples per gap when the grader integrates the local cell size. */
const SIZE_FIELD_SAMPLES = 400;

/** A metal edge on one axis: copper on the `metalSide` of `positionMm`. */
export interface MetalEdge {
	readonly positionMm: number;
	/** −1: metal at smaller coordinates; +1: metal at larger coordinates. */
	readonly metalSide: -1 | 1;
}

/** What one axis of the mesh must resolve. */
export interface AxisFeatures {
	/** Domain ends (the absorbing boundaries). */
	readonly fromMm: number;
	readonly toMm: number;
	/** Metal edges: each gets lines ⅓·d inside the metal and ⅔·d outside it (the thirds rule). */
	readonly edges: readonly MetalEdge[];
	/** Lines that must exist exactly (port, probe centre, sheets, layer faces). */
	readonly fixedMm: readonly number[];
	/** Where the fine (dielectric) limit applies; outside it the air limit. */
	readonly fineFromMm: number;
	readonly fineToMm: number;
}

export interface AxisPlan {
	/** Largest cell inside the fine span (λ/20 in the dielectric at the band's top, by mode). */
	readonly maxFineCellMm: number;
	/** Largest cell in air (λ0/20 at the band's top, by mode). */
	readonly maxAirCellMm: number;
	/** The cell d of the thirds rule at metal edges. */
	readonly edgeCellMm: number;
}

/**
 * The lines the thirds rule puts at one metal edge: ⅓·d inside the metal and ⅔·d outside, so the
 * edge falls one third into a cell and the field singularity there is sampled where FDTD's
 * staircase error is smallest (openEMS documentation, "FDTD mesh", the thirds rule; from memory).
 */
export function thirdsLines(edge: MetalEdge, edgeCellMm: number): [insideMm: number, outsideMm: number] {
	const s = edge.metalSide;
	return [edge.positionMm + (s * edgeCellMm) / 3, edge.positionMm - (s * 2 * edgeCellMm) / 3];
}

/** Sorted, de-duplicated; lines closer than `mergeMm` become one (fixed lines win, else their mean). */
function mergeLines(lines: { mm: number; fixed: boolean }[], mergeMm: number): number[] {
	const sorted = [...lines].sort((a, b) => a.mm - b.mm);
	const groups: { mm: number; fixed: boolean }[][] = [];
	for (const line of sorted) {
		const last = groups[groups.length - 1];
		if (last && line.mm - last[last.length - 1].mm < mergeMm) last.push(line);
		else groups.push([line]);
	}
	return groups.map((g) => {
		const fixed = g.filter((l) => l.fixed);
		const pick = fixed.length > 0 ? fixed : g;
		return pick.reduce((a, l) => a + l.mm, 0) / pick.length;
	});
}

/**
 * Builds one graded axis. The required lines (domain ends, fixed lines, thirds lines) are kept;
 * between them the cells follow a size field h(x) = min(limit(x), min over required lines p of
 * res(p) + (r − 1)·|x − p|), where res(p) is the smaller gap beside p: cells grow by at most the
 * ratio r away from every fine feature and never exceed the local limit.
 */
export function buildAxis(features: AxisFeatures, plan: AxisPlan): number[] {
	const { fromMm, toMm } = features;
	const required: { mm: number; fixed: boolean }[] = [
		{ mm: fromMm, fixed: true },
		{ mm: toMm, fixed: true },
		...features.fixedMm.map((mm) => ({ mm, fixed: true }))
	];
	for (const edge of features.edges) {
		for (const mm of thirdsLines(edge, plan.edgeCellMm)) required.push({ mm, fixed: false });
	}
	const inDomain = required.filter((l) => l.mm >= fromMm && l.mm <= toMm);
	const lines = mergeLines(inDomain, plan.edgeCellMm / 4);
	const limit = (x: number) => (x >= features.fineFromMm && x <= features.fineToMm ? plan.maxFineCellMm : plan.maxAirCellMm);
	const res = lines.map((p, i) => {
		const left = i > 0 ? p - lines[i - 1] : Infinity;
		const right = i < lines.length - 1 ? lines[i + 1] - p : Infinity;
		return Math.min(left, right, limit(p));
	});
	const slope = TARGET_GRADING_RATIO - 1;
	const size = (x: number) => {
		let h = limit(x);
		for (let i = 0; i < lines.length; i++) h = Math.min(h, res[i] + slope * Math.abs(x - lines[i]));
		return h;
	};
	const gaps: number[][] = [];
	for (let i = 0; i + 1 < lines.length; i++) {
		const a = lines[i];
		const b = lines[i + 1];
		const step = (b - a) / SIZE_FIELD_SAMPLES;
		// cumulative ∫ dx / h(x) at the sample points (midpoint rule)
		const cumulative: number[] = [0];
		for (let k = 0; k < SIZE_FIELD_SAMPLES; k++) cumulative.push(cumulative[k] + step / size(a + (k + 0.5) * step));
		const total = cumulative[SIZE_FIELD_SAMPLES];
		const fewest = Math.max(1, Math.ceil((b - a) / limit((a + b) / 2) - 1e-9));
		const cells = Math.max(fewest, cellCountFor(b - a, total, res[i], res[i + 1]));
		const gap: number[] = [a];
		let k = 0;
		for (let c = 1; c < cells; c++) {
			const want = (c * total) / cells;
			while (cumulative[k + 1] < want) k++;
			const frac = (want - cumulative[k]) / (cumulative[k + 1] - cumulative[k]);
			gap.push(a + (k + frac) * step);
		}
		gap.push(b);
		gaps.push(gap);
	}
	evenOutShortGaps(gaps);
	const out = [lines[0], ...gaps.flatMap((g) => g.slice(1))];
	const requiredIndex = new Set<number>();
	let index = 0;
	for (const g of gaps) {
		requiredIndex.add(index);
		index += g.length - 1;
	}
	requiredIndex.add(index);
	return relaxFreeLines(out, requiredIndex, limit);
}

/**
 * Cells for a gap: ceil of the size field's count, except in a short gap, where rounding down may
 * match the cells beside it better (a 1.4-cell gap between two thirds-rule cells stays one cell).
 */
function cellCountFor(gapMm: number, total: number, resA: number, resB: number): number {
	const up = Math.max(1, Math.ceil(total - 1e-6));
	if (total >= 4) return up;
	const down = Math.max(1, Math.floor(total));
	const badness = (n: number) => Math.max(Math.abs(Math.log(gapMm / n / resA)), Math.abs(Math.log(gapMm / n / resB)));
	return badness(down) < badness(up) ? down : up;
}

/** Gaps of at most this many cells are re-spaced evenly when their grading breaks the ratio. */
const EVEN_GAP_MAX_CELLS = 8;

/**
 * A short gap between required lines whose own cells, or whose end cells against the neighbouring
 * gaps, break MAX_GRADING_RATIO is re-spaced into equal cells (same count, so no cell grows past
 * the gap's limit): the cheap fix for the size field's rounding at closely spaced features.
 */
function evenOutShortGaps(gaps: number[][]): void {
	const cells = (g: number[]) => g.slice(1).map((l, i) => l - g[i]);
	const bad = (x: number, y: number) => x > MAX_GRADING_RATIO * y || y > MAX_GRADING_RATIO * x;
	for (let pass = 0; pass < 3; pass++) {
		for (let i = 0; i < gaps.length; i++) {
			const c = cells(gaps[i]);
			if (c.length > EVEN_GAP_MAX_CELLS) continue;
			const prev = i > 0 ? cells(gaps[i - 1]).at(-1) : undefined;
			const next = i + 1 < gaps.length ? cells(gaps[i + 1])[0] : undefined;
			const broken = c.some((x, j) => j > 0 && bad(c[j - 1], x)) || (prev !== undefined && bad(prev, c[0])) || (next !== undefined && bad(c[c.length - 1], next));
			if (!broken) continue;
			const a = gaps[i][0];
			const b = gaps[i][gaps[i].length - 1];
			gaps[i] = Array.from({ length: c.length + 1 }, (_, k) => (k === c.length ? b : a + ((b - a) * k) / c.length));
		}
	}
}

/** Passes of the free-line relaxation. */
const RELAXATION_PASSES = 30;

/**
 * Moves each free (not required) line so that the two cells beside it continue the geometric
 * run of the cells beyond them: a few passes even out the size jumps that rounding leaves where
 * two gaps meet, without undoing the grading (each pass only looks one cell further out).
 */
function relaxFreeLines(lines: number[], required: ReadonlySet<number>, limit: (xMm: number) => number): number[] {
	const out = [...lines];
	for (let pass = 0; pass < RELAXATION_PASSES; pass++) {
		for (let i = 2; i + 2 < out.length; i++) {
			if (required.has(i)) continue;
			const left = out[i - 1] - out[i - 2];
			const right = out[i + 2] - out[i + 1];
			const span = out[i + 1] - out[i - 1];
			// in a geometric run c1, c2, c3, c4 the middle pair keeps c3/c2 = (c4/c1)^(1/3)
			const ratio = Math.cbrt(right / left);
			const want = out[i - 1] + span / (1 + ratio);
			// never grow either cell past its local limit
			const lo = out[i + 1] - limit((out[i] + out[i + 1]) / 2);
			const hi = out[i - 1] + limit((out[i - 1] + out[i]) / 2);
			if (lo <= hi) out[i] = Math.min(hi, Math.max(lo, want));
		}
	}
	return out;
}

export interface MeshFeatures {
	readonly x: AxisFeatures;
	readonly y: AxisFeatures;
	readonly z: AxisFeatures;
}

export interface MeshPlan {
	readonly x: AxisPlan;
	readonly y: AxisPlan;
	readonly z: AxisPlan;
}

/** Builds the three graded axes. */
export function buildMesh(features: MeshFeatures, plan: MeshPlan): FieldMesh {
	return { xMm: buildAxis(features.x, plan.x), yMm: buildAxis(features.y, plan.y), zMm: buildAxis(features.z, plan.z) };
}

/** Largest ratio of neighbouring cells on one axis. */
export function largestGradingRatio(lines: readonly number[]): number {
	let worst = 1;
	for (let i = 1; i + 1 < lines.length; i++) {
		const a = lines[i] - lines[i - 1];
		const b = lines[i + 1] - lines[i];
		worst = Math.max(worst, a / b, b / a);
	}
	return worst;
}

const cellSizes = (lines: readonly number[]) => lines.slice(1).map((l, i) => l - lines[i]);

/** Cells, smallest and largest cell of a mesh (timesteps filled in by the runner). */
export function meshStatistics(mesh: FieldMesh, timesteps = 0): MeshStatistics {
	const sizes = [...cellSizes(mesh.xMm), ...cellSizes(mesh.yMm), ...cellSizes(mesh.zMm)];
	const cellsX = mesh.xMm.length - 1;
	const cellsY = mesh.yMm.length - 1;
	const cellsZ = mesh.zMm.length - 1;
	return {
		cellsX,
		cellsY,
		cellsZ,
		cellCount: cellsX * cellsY * cellsZ,
		smallestCellMm: sizes.reduce((m, s) => Math.min(m, s), Infinity),
		largestCellMm: sizes.reduce((m, s) => Math.max(m, s), -Infinity),
		timesteps
	};
}
