// `cli export` in a fresh tsx process: the files the shared pipeline makes, the same bytes as in-process, exit 2 on bad input.
import { spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { existsSync, mkdtempSync, readFileSync, readdirSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { goldenBundle, goldenDesign } from '../../fixtures/bundle/golden-bundle';

function cli(args: string[]) {
	const r = spawnSync('npx', ['tsx', 'src/cli/main.ts', 'export', ...args], { cwd: process.cwd(), encoding: 'utf8' });
	return { code: r.status, out: r.stdout, err: r.stderr };
}
const dir = mkdtempSync(join(tmpdir(), 'ff-export-'));
const design = join(dir, 'design.json');
writeFileSync(design, JSON.stringify(goldenDesign));
const sha = (b: Uint8Array) => createHash('sha256').update(b).digest('hex');

describe('cli export', () => {
	it('writes the same zip bytes as the in-process pipeline (the golden bundle)', async () => {
		const out = join(dir, 'bundle.zip');
		const r = cli([design, '--out', out, '--revision', 'B', '--date', '2026-11-20']);
		expect(r.err).toBe('');
		expect(r.code).toBe(0);
		expect(sha(readFileSync(out))).toBe(sha(await goldenBundle()));
	});

	it('writes only the chosen formats into a folder, with the manifest', () => {
		const out = join(dir, 'files');
		const r = cli([design, '--out', out, '--formats', 'gerber,drill', '--revision', 'B', '--date', '2026-11-20']);
		expect(r.code).toBe(0);
		expect(readdirSync(out).sort()).toEqual(
			['copper-bottom.gbr', 'copper-top.gbr', 'drill-plated.drl', 'manifest.json', 'mask-bottom.gbr', 'mask-top.gbr', 'profile.gbr'].map((s) => `sunroof-gnss-B.${s}`).sort()
		);
	});

	it.each([
		// a field out of range in the design
		{ name: 'an out-of-range design field', doc: { ...goldenDesign, frequencyHz: 5 }, extra: [], pattern: /^frequencyHz: 5 — .*allowed range/ },
		// an unknown format
		{ name: 'an unknown format', doc: goldenDesign, extra: ['--formats', 'gerber,pdf'], pattern: /^--formats: "pdf" — must be/ },
		// an impossible date
		{ name: 'a bad revision date', doc: goldenDesign, extra: ['--date', '2026-02-30'], pattern: /^date: "2026-02-30" — / }
	])('exits 2 with one line and writes nothing for $name', ({ doc, extra, pattern }) => {
		const file = join(dir, `bad-${Math.abs(JSON.stringify(doc).length)}.json`);
		writeFileSync(file, JSON.stringify(doc));
		const out = join(dir, `never-${extra.join('') || 'x'}.zip`);
		const r = cli([file, '--out', out, ...extra]);
		expect(r.code).toBe(2);
		expect(r.err.trim().split('\n').length).toBe(1);
		expect(r.err.trim()).toMatch(pattern);
		expect(existsSync(out)).toBe(false);
	});
});
