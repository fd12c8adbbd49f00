// `npm run bench`: one table of our medians beside floors measured in the same run, written to BENCHMARKS.md.
// Never part of `npm test`.
import { writeFileSync } from 'node:fs';
import { cpus } from 'node:os';
import { join } from 'node:path';
import { rootDir, runMain } from './lib/config.ts';
import { coreRows, type BenchRow } from './bench/core.ts';
import { httpRows } from './bench/http.ts';
import { runFuzzBench } from './bench/fuzz.ts';
import { runFullwaveBench } from './bench/fullwave.ts';
import { existingReliabilitySection, existingTopSection } from './bench/reliability-section.ts';
import { runJobsBench } from './bench/jobs.ts';
import { runSoakBench } from './bench/soak.ts';

function fmt(v: number): string {
	return v >= 100 ? v.toFixed(0) : v >= 10 ? v.toFixed(1) : v.toFixed(2);
}

function table(rows: BenchRow[]): string {
	const lines = ['| work | ours | floor | floor is | ratio | target | met |', '| --- | ---: | ---: | --- | ---: | --- | --- |'];
	for (const r of rows) {
		const unit = r.note ? '' : ` ${r.unit}`;
		lines.push(`| ${r.work} | ${fmt(r.ours)}${unit} | ${fmt(r.floor)}${unit} | ${r.floorName} | ${fmt(r.ratio)}× | ${r.target} | ${r.pass ? 'yes' : 'NO'} |`);
	}
	return lines.join('\n');
}

/** What profiling (node --cpu-prof) found where targets are missed; kept beside the numbers. */
const findings = `## Findings

- **One bundle download vs deflateRaw.** The floor compresses ~18 KB with zlib's C code (≈ 70 µs). A download
  also sizes, draws, checks, writes eight files, reads the Gerbers and drill back and zips. The "before" row
  replays the old chain in the same run (the artwork drawn for the gate, the files, the read-back and the
  one-point sweep; every file hashed by the hand-written SHA-256 for the manifest and again by node:crypto for
  the record); the "after" row is the single pipeline (the artwork drawn once and handed along, each file hashed
  once by Web Crypto). jszip deflates in JavaScript (≈ 12× zlib for these files), so the 2× target stays out of
  reach without replacing it; we keep it and note the miss. Measured twice on 2026-12-02 with
  \`npx tsx scripts/bench/bundle-rows.ts\` (beside a full test run): before 9.98 / 12.6 ms, after 10.9 / 11.4 ms —
  no gain beyond the ±15 % noise. Drawing the artwork is a small share of a download; the writers (now with the
  dimensioned drawing sheet and the legend), the read-back and jszip's deflate take the time.
- **Downloads.** A revision is immutable, so the server keeps each delivery's bytes and hashes in a bounded
  in-process cache (64 deliveries / 64 MB); every download still prepares the revision once, passes the gate
  and writes its export record. Profiling the download route under autocannon also showed every API-token
  request updating its token's "last used" time, so 50 connections queued on one row lock; it is now
  written at most once a minute.
- **p99 under 50 connections.** One Node process serves all 50 connections, so a request waits behind
  the others: latency ≈ connections ÷ throughput (Little's law). Even the trivial route's p99 sits near
  the 100 ms line on 2 cores; the bundle route, which also reads the revision, checks access and writes
  an export record per download, lands above it. Running one app process per core behind a balancer
  (the app is stateless) is the lever; one process is what this machine runs.
- **Sweep growth.** 10 000 points take a little less than 10× the time of 1 000 (fixed costs are spread
  over more points); the 9–11× band is there to catch super-linear growth, which this is not.
- Timings on a shared 2-core machine vary by ±30 % between runs; compare ratios, not absolute values.
`;

runMain(async () => {
	// --soak / --fuzz run only the reliability checks, which write their own section of BENCHMARKS.md.
	if (process.argv.includes('--soak')) return runSoakBench();
	if (process.argv.includes('--fuzz')) return runFuzzBench();
	// --jobs: field checks per minute through the queue with 1 and 2 workers (its own section).
	if (process.argv.includes('--jobs')) return runJobsBench();
	// --fullwave runs only the Field check timings on openEMS (minutes per case) and prints them as Markdown
	if (process.argv.includes('--fullwave')) return runFullwaveBench(process.argv);
	const started = Date.now();
	const rows: BenchRow[] = [];
	console.log('core rows…');
	rows.push(...(await coreRows()));
	if (!process.argv.includes('--core-only')) {
		console.log('HTTP rows (builds and starts its own server)…');
		rows.push(...(await httpRows({ seconds: 10 })));
	}
	const text = table(rows);
	console.log(`\n${text}\n`);
	const header = `# Benchmarks\n\nMeasured by \`npm run bench\` on ${new Date().toISOString().slice(0, 10)}, Node.js ${process.version}, ${cpus().length} cores (${cpus()[0]?.model ?? 'unknown CPU'}). Medians (p50) from tinybench after warm-up; the floor of each row is measured in the same run. Whole run: ${((Date.now() - started) / 1000).toFixed(0)} s.\n\n`;
	const reliability = existingReliabilitySection();
	const jobQueue = existingTopSection('## Job queue');
	writeFileSync(join(rootDir, 'BENCHMARKS.md'), `${header}${text}\n\n${findings}${jobQueue ? `\n${jobQueue}` : ''}${reliability ? `\n${reliability}` : ''}`);
	console.log('written to BENCHMARKS.md');
});
