// The trace the server keeps for a measurement is thinned for exactly the plot's pixel columns.
import { describe, expect, it } from 'vitest';
import { S11_PLOT_COLUMNS, S11_PLOT_MARGIN, S11_PLOT_WIDTH } from '../../../src/lib/components/s11-plot-frame';
import { TRACE_COLUMNS } from '../../../src/lib/server/measurements/measurement-trace';

describe('the S11 plot frame', () => {
	it('has as many drawing columns as the stored trace is thinned for', () => {
		expect(S11_PLOT_COLUMNS).toBe(S11_PLOT_WIDTH - S11_PLOT_MARGIN.left - S11_PLOT_MARGIN.right);
		expect(TRACE_COLUMNS).toBe(S11_PLOT_COLUMNS);
	});
});
