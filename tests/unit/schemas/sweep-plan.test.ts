// The sweep-plan form's draft ↔ plan document: the mode survives the round trip, a resize draft writes a plan as
// plans were written before modes (no mode), and every geometry row is a field the plan document accepts.
import { describe, expect, it } from 'vitest';
import { parseSweepPlan, sweepableFields } from '../../../src/lib/formats/sweep';
import { emptyAxisDraft, sweepDraftFromFields, sweepDraftFromPlan, sweepFieldChoices, sweepPlanDraftSchema, sweepPlanFromDraft } from '../../../src/lib/schemas/sweep-plan';

const axes = [{ ...emptyAxisDraft('substrate.relativePermittivity'), from: '3.4', to: '3.6', step: '0.1' }, emptyAxisDraft(), emptyAxisDraft(), emptyAxisDraft()];

describe('the sweep-plan draft', () => {
	it('writes hold-geometry into the plan and reads it back', () => {
		const draft = sweepPlanDraftSchema.parse({ name: 'Spread', combine: 'grid', mode: 'hold-geometry', axes });
		const { plan } = sweepPlanFromDraft(draft);
		expect(parseSweepPlan(plan).mode).toBe('hold-geometry');
		expect(sweepDraftFromPlan('Spread', parseSweepPlan(plan)).mode).toBe('hold-geometry');
	});

	it('writes a resize draft without a mode, and reads a stored plan without one as resize', () => {
		const { plan } = sweepPlanFromDraft(sweepPlanDraftSchema.parse({ name: 'Spread', mode: 'resize', axes }));
		expect(plan).not.toHaveProperty('mode');
		expect(sweepDraftFromPlan('Old', { combine: 'grid', axes: [{ field: 'frequencyHz', values: [2.45e9] }] }).mode).toBe('resize');
	});

	it('reads the mode from the form fields, and refuses an unknown one', () => {
		const fields: Record<string, string> = { name: 'Spread', mode: 'hold-geometry', 'axes.0.field': 'substrate.heightMm', 'axes.0.from': '1', 'axes.0.to': '1.6', 'axes.0.step': '0.2' };
		expect(sweepPlanDraftSchema.parse(sweepDraftFromFields((k) => fields[k])).mode).toBe('hold-geometry');
		expect(sweepPlanDraftSchema.safeParse(sweepDraftFromFields((k) => ({ ...fields, mode: 'keep' })[k])).success).toBe(false);
	});

	it('offers only fields the plan document accepts, the geometry rows among them', () => {
		for (const c of sweepFieldChoices) expect(sweepableFields).toContain(c.field);
		expect(sweepFieldChoices.map((c) => c.field)).toEqual(expect.arrayContaining(['overrides.lengthMm', 'overrides.widthMm', 'overrides.insetDepthMm', 'overrides.probeOffsetMm']));
	});
});
