// The frame both pattern plots (one patch's E/H cuts, an array's factor) draw their cuts in: θ from −90° to 90°
// across, dB (0 = the beam) up to a floor, and the half-power level.
import { scaleLinear } from 'd3-scale';

export const CUT_PLOT = { width: 720, height: 340, margin: { top: 20, right: 20, bottom: 44, left: 52 }, floorDb: -40, halfPowerDb: -3.0103 } as const;

export interface CutPlotScales {
	x: (angleDeg: number) => number;
	y: (db: number) => number;
	xTicks: readonly number[];
	yTicks: readonly number[];
}

export function cutPlotScales(): CutPlotScales {
	const { width, height, margin: m, floorDb } = CUT_PLOT;
	const x = scaleLinear().domain([-90, 90]).range([m.left, width - m.right]);
	// 3 dB of headroom keeps the beam's 0 dB apart from the frame and leaves room for its label
	const y = scaleLinear().domain([floorDb, 3]).range([height - m.bottom, m.top]);
	return { x, y, xTicks: [-90, -60, -30, 0, 30, 60, 90], yTicks: y.ticks(8).filter((t) => t <= 0) };
}

/** One cut as an SVG path: a level per angle, nulls deeper than the floor drawn on it. */
export function cutPath(scales: CutPlotScales, anglesDeg: readonly number[], db: readonly number[]): string {
	return anglesDeg.map((a, i) => `${i ? 'L' : 'M'}${scales.x(a).toFixed(1)},${scales.y(Math.max(db[i], CUT_PLOT.floorDb)).toFixed(1)}`).join('');
}
