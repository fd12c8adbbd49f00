// A long measured trace thinned for drawing: per pixel column only its lowest and highest point, so the dip survives.

/** One drawn point: [frequencyHz, s11Db]. */
export type TracePoint = readonly [frequencyHz: number, value: number];

/**
 * Splits the frequency span into `columns` equal columns and keeps, in frequency order, the lowest and
 * the highest point of each column (one point when they are the same). A plot `columns` pixels wide then
 * shows the same envelope as the full trace — every dip and every peak — from at most 2 × `columns`
 * points. A 150 000-point sweep drawn 688 px wide becomes at most 1 376 points; its minimum (the
 * resonance) is always one of them. Traces of at most 2 × `columns` points come back unchanged.
 *
 * `points` must be in increasing frequency order (as the Touchstone reader returns them). No argument
 * spreading and no recursion: the work is one pass, whatever the length.
 */
export function decimateTrace(points: readonly TracePoint[], columns: number): TracePoint[] {
	const columnCount = Math.max(1, Math.floor(Number.isFinite(columns) ? columns : 1));
	if (points.length <= 2 * columnCount) return points.slice();
	const startHz = points[0][0];
	const scale = columnCount / (points[points.length - 1][0] - startHz);
	const out: TracePoint[] = [];
	let column = 0;
	let low = 0;
	let high = 0;
	for (let i = 1; i <= points.length; i++) {
		const c = i === points.length ? -1 : Math.min(columnCount - 1, Math.floor((points[i][0] - startHz) * scale) || 0);
		if (c === column) {
			if (points[i][1] < points[low][1]) low = i;
			else if (points[i][1] > points[high][1]) high = i;
			continue;
		}
		// The column ends: its lowest and highest point, in frequency order.
		if (low === high) out.push(points[low]);
		else if (low < high) out.push(points[low], points[high]);
		else out.push(points[high], points[low]);
		column = c;
		low = i;
		high = i;
	}
	return out;
}
