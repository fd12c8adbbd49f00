// Benchmark rows 1–4: the pure core against floors measured in the same run (tinybench: warm-up, medians).
import { deflateRawSync } from 'node:zlib';
import { Bench } from 'tinybench';
import { arrayBenchDocument, buildArrayBenchFiles, bundle, gate, holdsFabFiles, prepare, prepareSized, readBack, writeFiles, type PreparedDesign } from '../../src/lib/design';
import { buildSweepDocument, createExportMeta, bundleFormatIds, formatIds, serializeSweep, sha256Hex, toSvg } from '../../src/lib/formats';
import { STANDARD_QUICK_TURN_PROFILE } from '../../src/lib/schemas/fab-profile';
import { legacyBundleDownload } from './legacy-download';
import { parseDesignInput } from '../../src/lib/schemas';
import { size } from '../../src/lib/rf';

export interface BenchRow {
	work: string;
	ours: number;
	floor: number;
	unit: 'µs' | 'ms';
	floorName: string;
	ratio: number;
	target: string;
	pass: boolean;
	note?: string;
}

/** Demo scenario input used by every core row. */
const input = {
	name: 'Bench sensor node',
	frequencyHz: 2.45e9,
	feed: 'inset',
	substrate: { relativePermittivity: 4.3, lossTangent: 0.017, heightMm: 1.6 }
};
const meta = createExportMeta({ designName: input.name, revisionLabel: 'A', revisionDate: '2026-11-20' });

async function medianUs(tasks: Record<string, () => unknown | Promise<unknown>>, time = 1500): Promise<Record<string, number>> {
	const bench = new Bench({ time, warmupTime: 300 });
	for (const [name, fn] of Object.entries(tasks)) bench.add(name, fn);
	await bench.run();
	const out: Record<string, number> = {};
	for (const task of bench.tasks) {
		const result = task.result as { latency?: { p50?: number } } | undefined;
		const p50Ms = result?.latency?.p50;
		if (p50Ms === undefined) throw new Error(`benchmark "${task.name}" produced no result`);
		out[task.name] = p50Ms * 1000;
	}
	return out;
}

function sweepPlan(points: number) {
	// a grid of two axes whose product is `points`
	const a = points === 1000 ? 40 : 100;
	const b = points / a;
	return {
		combine: 'grid',
		axes: [
			{ field: 'patchWidthMm', from: 30, to: 30 + (a - 1) * 0.05, step: 0.05 },
			{ field: 'substrate.relativePermittivity', from: 4.0, to: 4.0 + (b - 1) * 0.01, step: 0.01 }
		]
	};
}

/** The bundle download's before and after rows alone (also `npx tsx scripts/bench/bundle-rows.ts`). */
export async function bundleRows(): Promise<BenchRow[]> {
	const rows: BenchRow[] = [];
	// One bundle download's pure work: gate, files, read-back, zip and hashes. "before" is the old chain
	// (artwork ×4, hand-written SHA-256 plus node:crypto), "after" the pipeline (artwork once, Web Crypto once per file).
	const sized = size(parseDesignInput(input));
	const afterDownload = async () => {
		const prepared = prepareSized(sized);
		gate(prepared, STANDARD_QUICK_TURN_PROFILE);
		const files = await writeFiles(prepared, bundleFormatIds, meta);
		if (holdsFabFiles(files)) readBack(files, prepared, meta);
		const body = await bundle(files, meta);
		return { body, sha256: await sha256Hex(body) };
	};
	const beforeDownload = () => legacyBundleDownload(sized, meta, STANDARD_QUICK_TURN_PROFILE);
	const [after, before] = await Promise.all([afterDownload(), beforeDownload()]);
	if (after.sha256 !== before.sha256) throw new Error('the pipeline and the old chain made different bundles');
	const files = await writeFiles(prepareSized(sized), bundleFormatIds, meta);
	const concatenated = new Uint8Array(files.reduce((n, f) => n + f.bytes.length, 0));
	let offset = 0;
	for (const f of files) {
		concatenated.set(f.bytes, offset);
		offset += f.bytes.length;
	}
	const r3 = await medianUs({ after: afterDownload, before: beforeDownload, deflate: () => deflateRawSync(concatenated) });
	rows.push({ work: 'one bundle download, before (artwork ×4, two hashes)', ours: r3.before, floor: r3.deflate, unit: 'µs', floorName: 'deflateRaw of the same bytes', ratio: r3.before / r3.deflate, target: '≤ 2×', pass: r3.before / r3.deflate <= 2 });
	rows.push({ work: 'one bundle download, after (artwork once, Web Crypto)', ours: r3.after, floor: r3.deflate, unit: 'µs', floorName: 'deflateRaw of the same bytes', ratio: r3.after / r3.deflate, target: '≤ 2×', pass: r3.after / r3.deflate <= 2 });
	return rows;
}

export async function coreRows(): Promise<BenchRow[]> {
	const rows: BenchRow[] = [];

	const r1 = await medianUs({ size: () => size(parseDesignInput(input)), validate: () => parseDesignInput(input) });
	rows.push({ work: 'sizing one design', ours: r1.size, floor: r1.validate, unit: 'µs', floorName: 'zod validation alone', ratio: r1.size / r1.validate, target: '≤ 50 µs', pass: r1.size <= 50 });

	const r2 = await medianUs({
		preview: () => toSvg(prepare(parseDesignInput(input)).artwork, meta),
		size: () => size(parseDesignInput(input))
	});
	rows.push({ work: 'live preview: size + artwork + SVG', ours: r2.preview, floor: r2.size, unit: 'µs', floorName: 'sizing alone', ratio: r2.preview / r2.size, target: '≤ 1000 µs', pass: r2.preview <= 1000 });

	rows.push(...(await bundleRows()));

	const sweepUs: Record<number, number> = {};
	for (const points of [1000, 10000]) {
		const plan = sweepPlan(points);
		const doc = buildSweepDocument(input, plan, meta);
		if (doc.points.length !== points) throw new Error(`sweep plan made ${doc.points.length} points, wanted ${points}`);
		const r = await medianUs({ ours: () => serializeSweep(doc), floor: () => JSON.stringify(doc) }, points === 1000 ? 1500 : 3000);
		sweepUs[points] = r.ours;
		rows.push({ work: `sweep JSON, ${points} points`, ours: r.ours, floor: r.floor, unit: 'µs', floorName: 'JSON.stringify of the same object', ratio: r.ours / r.floor, target: '≤ 1.5×', pass: r.ours / r.floor <= 1.5 });
	}
	const growth = sweepUs[10000] / sweepUs[1000];
	rows.push({ work: 'sweep JSON growth 1 000 → 10 000', ours: sweepUs[10000], floor: sweepUs[1000], unit: 'µs', floorName: '1 000-point time', ratio: growth, target: '9–11×', pass: growth >= 9 && growth <= 11 });

	// Arrays (issue 10): Gerber + drill + DXF + SVG of an 8×8 and a 32×32 array; 16× the elements.
	const arrays = await medianUs({ a8: () => buildArrayBenchFiles(8), a32: () => buildArrayBenchFiles(32) }, 4000);
	rows.push({ work: '32×32 array files (Gerber, drill, DXF, SVG)', ours: arrays.a32 / 1000, floor: arrays.a8 / 1000, unit: 'ms', floorName: '8×8 array files', ratio: arrays.a32 / arrays.a8, target: '< 1000 ms; ≈ 16× growth', pass: arrays.a32 / 1000 < 1000 && arrays.a32 / arrays.a8 <= 20 });
	rows.push(...(await arrayDownloadRows()));
	return rows;
}

/** A fresh copy of the artwork's layers: the design-rule check keeps its copper grouping per layer object, so a repeat on the same object would be a cache hit. */
const freshLayers = (prepared: PreparedDesign): PreparedDesign => ({ ...prepared, artwork: { ...prepared.artwork, layers: prepared.artwork.layers.map((l) => ({ ...l })) } });

/** Median of `runs` timings of fn, in ms (for work too slow for tinybench's many samples). */
async function medianMs(fn: () => unknown | Promise<unknown>, runs: number): Promise<number> {
	const times: number[] = [];
	for (let i = 0; i < runs; i++) {
		const t0 = performance.now();
		await fn();
		times.push(performance.now() - t0);
	}
	return times.sort((a, b) => a - b)[Math.floor(times.length / 2)];
}

/**
 * Issue 13, item 1: the design-rule check of the largest array (64 × 64) and each step of an array's download
 * at 8 × 8 and 32 × 32 (16× the elements): near-linear steps grow by about 16×, within 20×.
 */
export async function arrayDownloadRows(): Promise<BenchRow[]> {
	const rows: BenchRow[] = [];
	const P = STANDARD_QUICK_TURN_PROFILE;
	const meta = createExportMeta({ designName: 'Bench array', revisionLabel: 'A', revisionDate: '2026-12-02' });
	const prep = (side: number) => prepare(parseDesignInput(arrayBenchDocument(side)));
	const a8 = prep(8), a32 = prep(32), a64 = prep(64);
	const check8 = await medianMs(() => gate(freshLayers(a8), P), 5);
	const check64 = await medianMs(() => gate(freshLayers(a64), P), 3);
	rows.push({ work: '64×64 array design-rule check (28 732 copper shapes)', ours: check64, floor: check8, unit: 'ms', floorName: '8×8 array check', ratio: check64 / check8, target: '< 1000 ms', pass: check64 < 1000 });
	type Step = { name: string; run: (side: number) => unknown | Promise<unknown> };
	const prepared = { 8: a8, 32: a32 } as const;
	const of = (side: number) => prepared[side as 8 | 32];
	const files = { 8: await writeFiles(a8, formatIds, meta), 32: await writeFiles(a32, formatIds, meta) } as const;
	const steps: Step[] = [
		{ name: 'artwork build (prepare)', run: (side) => prepare(of(side).input) },
		{ name: 'design-rule check', run: (side) => gate(freshLayers(of(side)), P) },
		{ name: 'all files written and hashed', run: (side) => writeFiles(of(side), formatIds, meta) },
		{ name: 'read-back self-check (@tracespace/parser)', run: (side) => readBack(files[side as 8 | 32], of(side), meta) },
		{ name: 'zip', run: (side) => bundle(files[side as 8 | 32], meta) }
	];
	for (const step of steps) {
		const small = await medianMs(() => step.run(8), 3);
		const large = await medianMs(() => step.run(32), 1);
		const growth = large / small;
		rows.push({ work: `array download step: ${step.name}, 8×8 → 32×32`, ours: large, floor: small, unit: 'ms', floorName: '8×8, same step', ratio: growth, target: '≤ 20× for 16× the elements', pass: growth <= 20 });
	}
	return rows;
}
