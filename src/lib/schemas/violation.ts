// A broken design rule, as the check reports it, the API's 422 body carries it and a waiver lists it: one zod schema, its type inferred.
import { z } from 'zod';

/** Our rule names. Stable: the UI, the API's 422 body and waivers refer to them. */
export const drcRuleIds = ['trace-width', 'copper-spacing', 'drill-size', 'annular-ring', 'edge-clearance', 'slot-width', 'stack-build', 'launch-gap', 'launch-via-edge', 'launch-via-spacing', 'launch-annular-ring', 'launch-outside-board', 'legend-width', 'legend-clearance', 'legend-edge', 'hole-keep-out'] as const;
export type DrcRuleId = (typeof drcRuleIds)[number];

export const violationSchema = z
	.strictObject({
		ruleId: z.enum(drcRuleIds),
		layerId: z.string().nullable().meta({ description: 'The artwork layer of the offending copper; null for a drill on its own' }),
		shapeIds: z.array(z.string()).readonly().meta({ description: 'Artwork shape (and drill) ids involved, in a fixed order' }),
		location: z.strictObject({ xMm: z.number(), yMm: z.number() }).readonly().meta({ description: 'Where on the board, mm from its lower left corner' }),
		measuredMm: z.number().meta({ description: 'What the artwork has' }),
		requiredMm: z.number().meta({ description: 'What the fab profile asks for at least' }),
		message: z.string().meta({ description: 'One sentence for humans' })
	})
	.readonly()
	.meta({ id: 'Violation', description: 'One broken design rule: which rule, which shapes, where, measured against required' });

export type Violation = z.output<typeof violationSchema>;
