// The sweep plan: which design-input fields vary, over which values, combined as a grid or zipped.
import { z } from 'zod';
import { InputError, parseWith } from '../../schemas';
import { sweepModes, type SweepMode } from '../../schemas/sweep-plan';

/** Hard limit on points in one sweep document; past it nothing is built. */
export const MAX_SWEEP_POINTS = 10_000;

/** Numeric design-input fields a sweep may vary (dotted paths into the design-input document). */
export const sweepableFields = [
	'frequencyHz',
	'substrate.relativePermittivity',
	'substrate.lossTangent',
	'substrate.heightMm',
	'substrate.copperThicknessUm',
	'substrate.copperConductivitySPerM',
	'targetImpedanceOhm',
	'feedLineImpedanceOhm',
	'patchWidthMm',
	'groundMarginMm',
	'inset.notchGapMm',
	'probe.drillDiameterMm',
	'probe.padDiameterMm',
	'probe.clearanceDiameterMm',
	'slot.lengthMm',
	'slot.widthMm',
	'slot.stubLengthMm',
	'proximity.overlapMm',
	'parasitic.sizeRatio',
	'array.spacingXWavelengths',
	'array.spacingYWavelengths',
	'array.scanAngleDeg',
	'overrides.lengthMm',
	'overrides.widthMm',
	'overrides.radiusMm',
	'overrides.insetDepthMm',
	'overrides.probeOffsetMm'
] as const;
export type SweepableField = (typeof sweepableFields)[number];

/**
 * Sweepable fields that are the geometry itself (patch length, width, radius, inset depth, probe offset). A plan
 * with one of them always holds the rest of the revision's geometry, whatever its `mode`.
 */
export const geometryFields: readonly SweepableField[] = ['overrides.lengthMm', 'overrides.widthMm', 'overrides.radiusMm', 'overrides.insetDepthMm', 'overrides.probeOffsetMm'];

export { sweepModes, type SweepMode } from '../../schemas/sweep-plan';

/** True when the plan's points hold the revision's geometry (hold-geometry mode, or any geometry axis). */
export function holdsGeometry(plan: { mode?: SweepMode; axes: readonly { field: string }[] }): boolean {
	return plan.mode === 'hold-geometry' || plan.axes.some((a) => (geometryFields as readonly string[]).includes(a.field));
}

const finite = z.number({ error: 'must be a finite number' }).refine(Number.isFinite, { error: 'must be a finite number' });

const rangeAxisSchema = z
	.strictObject({
		field: z.enum(sweepableFields),
		from: finite,
		to: finite,
		step: finite.refine((v) => v > 0, { error: 'must be greater than 0' })
	})
	.refine((a) => a.to >= a.from, { error: 'must be at least "from"', path: ['to'] });

const listAxisSchema = z.strictObject({
	field: z.enum(sweepableFields),
	values: z.array(finite).min(1, { error: 'needs at least one value' }).max(MAX_SWEEP_POINTS, { error: `at most ${MAX_SWEEP_POINTS} values` })
});

export const sweepPlanSchema = z
	.strictObject({
		planVersion: z.literal(1).default(1),
		/** grid: every combination of the axes; zip: the i-th value of every axis together. */
		combine: z.enum(['grid', 'zip']).default('grid'),
		/**
		 * resize: every point sized afresh; hold-geometry: the revision's patch length, width (or radius), inset depth or
		 * probe offset and ground margin held, only the swept fields vary (the feed line keeps its impedance). Absent:
		 * resize, the meaning of every plan stored before the field.
		 */
		mode: z.enum(sweepModes).optional(),
		axes: z.array(z.union([rangeAxisSchema, listAxisSchema])).min(1, { error: 'needs at least one axis' }).max(6, { error: 'at most 6 axes' })
	})
	.superRefine((p, ctx) => {
		const seen = new Set<string>();
		p.axes.forEach((a, i) => {
			if (seen.has(a.field)) ctx.addIssue({ code: 'custom', path: ['axes', i, 'field'], input: a.field, message: 'each field may be swept by one axis only' });
			seen.add(a.field);
		});
	});

export type SweepPlan = z.output<typeof sweepPlanSchema>;
export type SweepAxis = SweepPlan['axes'][number];

/** Values along one range axis: from + i·step up to `to` (a step landing within 1e-9 steps of `to` counts). */
export function axisLength(axis: SweepAxis): number {
	return 'values' in axis ? axis.values.length : Math.floor((axis.to - axis.from) / axis.step + 1e-9) + 1;
}

export function axisValues(axis: SweepAxis): number[] {
	if ('values' in axis) return [...axis.values];
	const n = axisLength(axis);
	return Array.from({ length: n }, (_, i) => Number((axis.from + i * axis.step).toPrecision(12)));
}

/** Number of points the plan makes, computed without building any. */
export function countSweepPoints(plan: SweepPlan): number {
	const lengths = plan.axes.map(axisLength);
	if (plan.combine === 'zip') return lengths[0];
	return lengths.reduce((a, b) => a * b, 1);
}

/** Validates a plan document and its size; throws InputError (paths start with "plan."). */
export function parseSweepPlan(raw: unknown): SweepPlan {
	let plan: SweepPlan;
	try {
		plan = parseWith(sweepPlanSchema, raw);
	} catch (e) {
		if (e instanceof InputError) throw new InputError(e.issues.map((i) => ({ ...i, path: i.path ? `plan.${i.path}` : 'plan' })));
		throw e;
	}
	if (plan.combine === 'zip') {
		const lengths = plan.axes.map(axisLength);
		const bad = lengths.findIndex((l) => l !== lengths[0]);
		if (bad > 0) throw new InputError([{ path: `plan.axes.${bad}`, value: lengths[bad], message: `a zipped plan needs axes of equal length (axis 0 has ${lengths[0]} values, this one ${lengths[bad]})` }]);
	}
	const count = countSweepPoints(plan);
	if (count > MAX_SWEEP_POINTS) {
		throw new InputError([{ path: 'plan.axes', value: count, message: `the plan makes ${count} points; allowed range [1, ${MAX_SWEEP_POINTS}]` }]);
	}
	return plan;
}
