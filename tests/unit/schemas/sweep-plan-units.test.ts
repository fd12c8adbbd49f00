// The sweep-plan form in the person's length unit: length axes typed in mil (or naming "mil"/"mm") become the same mm
// plan as the mm equivalent; non-length axes (εr, tanδ, GHz) are untouched by the unit; bad text is refused, not guessed.
// 1 mil = 0.0254 mm exactly (1959 international yard and pound agreement: 1 in = 25.4 mm).
import { describe, expect, it } from 'vitest';
import { countSweepPoints, parseSweepPlan } from '../../../src/lib/formats/sweep';
import { emptyAxisDraft, isLengthSweepField, sweepDraftFromPlan, sweepFieldUnit, sweepPlanDraftSchema, sweepPlanFromDraft, sweepValueInUnit } from '../../../src/lib/schemas/sweep-plan';

const range = (field: string, from: string, to: string, step: string) => ({ ...emptyAxisDraft(field), from, to, step });
const list = (field: string, values: string) => ({ ...emptyAxisDraft(field), mode: 'list' as const, values });
const draft = (...axes: ReturnType<typeof emptyAxisDraft>[]) => sweepPlanDraftSchema.parse({ name: 'Units', axes });

describe('length axes in the person’s unit', () => {
	it('reads a thickness range typed in mil as the mm range it names (31 mil = 0.7874 mm, 62 mil = 1.5748 mm)', () => {
		const inMil = parseSweepPlan(sweepPlanFromDraft(draft(range('substrate.heightMm', '31', '62', '31')), 'mil').plan);
		const inMm = parseSweepPlan(sweepPlanFromDraft(draft(range('substrate.heightMm', '0.7874', '1.5748', '0.7874')), 'mm').plan);
		expect(inMil).toEqual(inMm);
		expect(inMil.axes[0]).toEqual({ field: 'substrate.heightMm', from: 0.7874, to: 1.5748, step: 0.7874 });
		expect(countSweepPoints(inMil)).toBe(2);
	});

	it('lets an explicit unit win over the person’s unit ("8 mil" for a person in mm; "0.2032 mm" for one in mil)', () => {
		const a = sweepPlanFromDraft(draft(range('overrides.insetDepthMm', '8 mil', '16 mil', '4 mil')), 'mm').plan.axes[0];
		const b = sweepPlanFromDraft(draft(range('overrides.insetDepthMm', '0.2032 mm', '0.4064mm', '4')), 'mil').plan.axes[0];
		expect(a).toEqual({ field: 'overrides.insetDepthMm', from: 0.2032, to: 0.4064, step: 0.1016 });
		expect(b).toEqual(a);
	});

	it('reads a list of lengths in mil, with or without units, and keeps "8 mil, 10 mil" as two values', () => {
		expect(sweepPlanFromDraft(draft(list('patchWidthMm', '1000 1100; 1200')), 'mil').plan.axes[0]).toEqual({ field: 'patchWidthMm', values: [25.4, 27.94, 30.48] });
		expect(sweepPlanFromDraft(draft(list('overrides.probeOffsetMm', '8 mil, 10 mil;0.3 mm')), 'mm').plan.axes[0]).toEqual({ field: 'overrides.probeOffsetMm', values: [0.2032, 0.254, 0.3] });
	});

	it('leaves εr, tanδ and frequency in their own units whatever the length unit', () => {
		const d = draft(range('substrate.relativePermittivity', '3.4', '3.6', '0.1'), list('substrate.lossTangent', '0.001, 0.002'), range('frequencyHz', '2.4', '2.5', '0.05'));
		expect(sweepPlanFromDraft(d, 'mil').plan).toEqual(sweepPlanFromDraft(d, 'mm').plan);
		expect(sweepPlanFromDraft(d, 'mil').plan.axes[2]).toEqual({ field: 'frequencyHz', from: 2.4e9, to: 2.5e9, step: 5e7 });
		expect(sweepFieldUnit('frequencyHz', 'mil')).toBe('GHz');
		expect(sweepFieldUnit('substrate.relativePermittivity', 'mil')).toBe('');
		expect(isLengthSweepField('substrate.copperThicknessUm')).toBe(false);
	});

	it('refuses text the unit parser refuses (an unknown unit, a blank) as a non-number the plan schema refuses', () => {
		const { plan } = sweepPlanFromDraft(draft(range('substrate.heightMm', '31 furlong', '62', '')), 'mil');
		expect(Number.isNaN(plan.axes[0].from)).toBe(true);
		expect(Number.isNaN(plan.axes[0].step)).toBe(true);
		expect(() => parseSweepPlan(plan)).toThrow(/axes\.0/);
		expect(Number.isNaN((sweepPlanFromDraft(draft(list('overrides.lengthMm', '1100 mil, 12 parsec')), 'mm').plan.axes[0].values as number[])[1])).toBe(true);
	});

	it('shows a stored plan back in mil (1.6 mm → 62.9921 mil) and round-trips it to the same mm plan', () => {
		const stored = parseSweepPlan({ planVersion: 1, combine: 'grid', axes: [{ field: 'substrate.heightMm', from: 0.8, to: 1.6, step: 0.4 }] });
		const back = sweepDraftFromPlan('Again', stored, 'mil');
		expect(back.axes[0]).toMatchObject({ from: '31.4961', to: '62.9921', step: '15.748' });
		expect(parseSweepPlan(sweepPlanFromDraft(back, 'mil').plan)).toEqual(stored);
		expect(sweepValueInUnit('substrate.heightMm', 1.6, 'mil')).toBe(62.9921);
		expect(sweepValueInUnit('substrate.heightMm', 1.6, 'mm')).toBe(1.6);
		expect(sweepValueInUnit('frequencyHz', 2.45e9, 'mil')).toBe(2.45);
		expect(sweepFieldUnit('substrate.heightMm', 'mil')).toBe('mil');
	});
});
