// decimateTrace: min/max per pixel column keeps the envelope (and the resonance dip) of any trace in at most 2 points per column.
// Min/max-per-column decimation of a line plot: common practice, no source.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { decimateTrace, type TracePoint } from '../../../../src/lib/formats/touchstone';

/** A resonance dip on a noisy −2 dB floor (demo data), `n` points from 2.0 to 3.0 GHz; the dip is one sample wide. */
function dipTrace(n: number, dipIndex: number): TracePoint[] {
	const out: TracePoint[] = [];
	for (let i = 0; i < n; i++) out.push([2e9 + (i / (n - 1)) * 1e9, i === dipIndex ? -31.5 : -2 - 0.5 * Math.sin(i * 0.37)]);
	return out;
}

function lowest(points: readonly TracePoint[]): number {
	let v = Infinity;
	for (const p of points) v = Math.min(v, p[1]);
	return v;
}

function highest(points: readonly TracePoint[]): number {
	let v = -Infinity;
	for (const p of points) v = Math.max(v, p[1]);
	return v;
}

/** How many kept points fall in each of `columns` equal frequency columns of the original span. */
function perColumn(points: readonly TracePoint[], original: readonly TracePoint[], columns: number): number[] {
	const start = original[0][0];
	const span = original[original.length - 1][0] - start;
	const counts = new Array<number>(columns).fill(0);
	for (const p of points) counts[Math.min(columns - 1, Math.floor(((p[0] - start) / span) * columns))]++;
	return counts;
}

describe('decimateTrace', () => {
	it('keeps a one-sample dip of a 150 000-point sweep in at most 2 points per column', () => {
		const trace = dipTrace(150_000, 73_211);
		const kept = decimateTrace(trace, 688);
		expect(kept.length).toBeLessThanOrEqual(2 * 688);
		expect(lowest(kept)).toBe(-31.5);
		expect(kept).toContainEqual(trace[73_211]);
		for (const n of perColumn(kept, trace, 688)) expect(n).toBeLessThanOrEqual(2);
	});

	it('returns a short trace unchanged (a copy)', () => {
		const trace = dipTrace(101, 50);
		const kept = decimateTrace(trace, 688);
		expect(kept).toEqual(trace);
		expect(kept).not.toBe(trace);
	});

	it('keeps points in frequency order, each one taken from the input', () => {
		const trace = dipTrace(10_000, 1);
		const kept = decimateTrace(trace, 100);
		const inInput = new Set(trace);
		for (let i = 0; i < kept.length; i++) {
			expect(inInput.has(kept[i])).toBe(true);
			if (i > 0) expect(kept[i][0]).toBeGreaterThan(kept[i - 1][0]);
		}
	});

	it('holds for any increasing trace: same minimum and maximum, at most 2 points per column', () => {
		fc.assert(
			// levels as a reader gives them: −0 dB is 0 dB (+0 added turns −0 into +0), else a column holding both keeps
			// whichever came first and toBe's Object.is tells −0 from 0 (the CI run of 2026-12-02 met exactly that)
			fc.property(fc.array(fc.double({ min: -80, max: 0, noNaN: true }).map((v) => v + 0), { minLength: 2, maxLength: 3000 }), fc.integer({ min: 1, max: 400 }), (values, columns) => {
				const trace: TracePoint[] = values.map((v, i) => [1e9 + i * 1e5, v]);
				const kept = decimateTrace(trace, columns);
				expect(lowest(kept)).toBe(lowest(trace));
				expect(highest(kept)).toBe(highest(trace));
				expect(kept.length).toBeLessThanOrEqual(Math.max(trace.length <= 2 * columns ? trace.length : 0, 2 * columns));
				if (trace.length > 2 * columns) for (const n of perColumn(kept, trace, columns)) expect(n).toBeLessThanOrEqual(2);
			}),
			{ numRuns: 60 }
		);
	});

	it('treats a nonsense column count as one column', () => {
		const trace = dipTrace(50, 20);
		for (const columns of [0, -3, Number.NaN]) {
			const kept = decimateTrace(trace, columns);
			expect(kept).toHaveLength(2);
			expect(lowest(kept)).toBe(-31.5);
		}
	});
});
