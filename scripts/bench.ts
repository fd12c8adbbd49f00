// `npm run bench`: one table of our medians beside floors measured in the same run, written to BENCHMARKS.md.
// Never part of `npm test`.
import { writeFileSync } from 'node:fs';
import { cpus } from 'node:os';
import { join } from 'node:path';
import { rootDir, runMain } from './lib/config.ts';
import { coreRows, type BenchRow } from './bench/core.ts';
import { httpRows } from './bench/http.ts';
import { runFuzzBench } from './bench/fuzz.ts';
import { existingReliabilitySection } from './bench/reliability-section.ts';
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

runMain(async () => {
	// --soak / --fuzz run only the reliability checks, which write their own section of BENCHMARKS.md.
	if (process.argv.includes('--soak')) return runSoakBench();
	if (process.argv.includes('--fuzz')) return runFuzzBench();
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
	writeFileSync(join(rootDir, 'BENCHMARKS.md'), `${header}${text}\n${reliability ? `\n${reliability}` : ''}`);
	console.log('written to BENCHMARKS.md');
});
