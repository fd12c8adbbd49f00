// A measurement's plot trace: its analysed samples, in dB, thinned to at most 2 points per pixel column of the S11 plot.
import { decimateTrace, type TracePoint } from '../../formats/touchstone';
import type { ResponsePoint } from '../../rf/measured-response';

/** Pixel columns of the S11 plot's drawing area (components/s11-plot-frame.ts: 760 − 54 − 18); a unit test keeps them equal. */
export const TRACE_COLUMNS = 688;

/** At most 2 × TRACE_COLUMNS points; the lowest |S11| of the sweep is always among them. */
export function traceOf(points: readonly ResponsePoint[]): TracePoint[] {
	return decimateTrace(
		points.map((p) => [p.frequencyHz, p.s11Db] as const),
		TRACE_COLUMNS
	);
}
