// The "## Reliability" section of BENCHMARKS.md: `--fuzz` and `--soak` each replace their own
// subsection and leave the rest of the file (the benchmark table) as it is.
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { rootDir } from '../lib/config.ts';

const HEADING = '## Reliability';
const INTRO = `${HEADING}\n\nWritten by \`npm run bench -- --fuzz\` and \`npm run bench -- --soak\` (never by \`npm test\`, which runs a seeded sample of the same fuzz cases and the fault tests in tests/integration/hardening/).\n`;

export function writeReliabilitySubsection(title: string, body: string): void {
	const file = join(rootDir, 'BENCHMARKS.md');
	const text = existsSync(file) ? readFileSync(file, 'utf8') : '# Benchmarks\n';
	const at = text.indexOf(`\n${HEADING}`);
	const before = at >= 0 ? text.slice(0, at).trimEnd() : text.trimEnd();
	const section = at >= 0 ? text.slice(at + 1) : INTRO;
	// Subsections are "### <title>" blocks; replace ours, keep the others in their order.
	const parts = section.split(/\n(?=### )/);
	const head = parts[0].startsWith(HEADING) ? parts.shift()! : INTRO;
	const block = `### ${title}\n\n${body.trim()}\n`;
	const i = parts.findIndex((p) => p.startsWith(`### ${title}\n`));
	if (i >= 0) parts[i] = block;
	else parts.push(block);
	writeFileSync(file, `${before}\n\n${[head.trimEnd() + '\n', ...parts.map((p) => p.trimEnd() + '\n')].join('\n')}`);
}

/** The existing Reliability section (for the main bench run, which rewrites the rest of the file). */
export function existingReliabilitySection(): string {
	const file = join(rootDir, 'BENCHMARKS.md');
	if (!existsSync(file)) return '';
	const text = readFileSync(file, 'utf8');
	const at = text.indexOf(`\n${HEADING}`);
	return at >= 0 ? text.slice(at + 1) : '';
}

/** Replaces (or appends) a top-level "## …" section of BENCHMARKS.md, leaving every other section as it is. */
export function writeTopSection(heading: string, body: string): void {
	const file = join(rootDir, 'BENCHMARKS.md');
	const text = existsSync(file) ? readFileSync(file, 'utf8') : '# Benchmarks\n';
	const parts = text.split(/\n(?=## )/);
	const block = `${heading}\n\n${body.trim()}\n`;
	const i = parts.findIndex((p) => p.startsWith(`${heading}\n`));
	// A new section goes before the Reliability section, which the main run keeps as the file's tail.
	const reliability = parts.findIndex((p) => p.startsWith(`${HEADING}\n`));
	if (i >= 0) parts[i] = block;
	else if (reliability >= 0) parts.splice(reliability, 0, block);
	else parts.push(block);
	writeFileSync(file, parts.map((p) => p.trimEnd() + '\n').join('\n'));
}

/** An existing top-level section (kept by the main bench run, which rewrites the table), or ''. */
export function existingTopSection(heading: string): string {
	const file = join(rootDir, 'BENCHMARKS.md');
	if (!existsSync(file)) return '';
	const part = readFileSync(file, 'utf8')
		.split(/\n(?=## )/)
		.find((p) => p.startsWith(`${heading}\n`));
	return part ? part.trimEnd() + '\n' : '';
}
