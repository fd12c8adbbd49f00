// The pattern plots' shared frame: θ −90°…90° spans the plot between its margins, 0 dB sits 3 dB below the top, and a
// null deeper than the floor is drawn on the floor (arithmetic of the scales, no outside source).
import { describe, expect, it } from 'vitest';
import { CUT_PLOT, cutPath, cutPlotScales } from '../../../src/lib/components/cut-plot';

describe('cut plot frame', () => {
	const s = cutPlotScales();
	const { width, height, margin: m, floorDb } = CUT_PLOT;

	it('puts −90° and 90° on the margins and broadside in the middle', () => {
		expect(s.x(-90)).toBe(m.left);
		expect(s.x(90)).toBe(width - m.right);
		expect(s.x(0)).toBe((m.left + width - m.right) / 2);
	});

	it('ticks from the floor to 0 dB only', () => {
		expect(s.yTicks.at(-1)).toBe(0);
		expect(s.yTicks[0]).toBeGreaterThanOrEqual(floorDb);
		expect(s.yTicks.every((t) => t <= 0)).toBe(true);
	});

	it('draws a null below the floor on the floor', () => {
		const d = cutPath(s, [-90, 0, 90], [-120, 0, -3]);
		expect(d).toBe(`M${m.left.toFixed(1)},${(height - m.bottom).toFixed(1)}L${s.x(0).toFixed(1)},${s.y(0).toFixed(1)}L${(width - m.right).toFixed(1)},${s.y(-3).toFixed(1)}`);
	});
});
