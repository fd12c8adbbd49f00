// The engine-reference bench's edit of the engine's own tutorial (openEMS 0.0.35, Tutorials/Simple_Patch_Antenna.m,
// Debian's octave-openems): every parameter it swaps keeps the shipped value as its default, the plots, the field dump
// and the far-field box go, and a file that is not that tutorial is refused. Skipped where the tutorial is not installed.
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { findTutorial, headlessScript } from '../../../../scripts/bench/engine-reference';

const tutorial = findTutorial();

describe.skipIf(!tutorial)('the engine tutorial run headless', () => {
	it('keeps the shipped values as the defaults of the parameters it swaps', () => {
		const script = headlessScript(tutorial!);
		// the shipped values (openEMS 0.0.35 Simple_Patch_Antenna.m): patch 32 × 40 mm, εr 3.38, 60 × 60 × 1.524 mm, 4 cells, feed at x = −6 mm
		for (const line of ["envnum('PW', 32)", "envnum('PL', 40)", "envnum('EPS', 3.38)", "envnum('SW', 60)", "envnum('SL', 60)", "envnum('H', 1.524)", "envnum('CELLS', 4)", "-envnum('FEED', 6)", "envnum('TAND', 1e-3)", "envnum('FK', 2.45e9)"]) {
			expect(script).toContain(line);
		}
		// the tutorial's mesh rules stay its own unless overridden: λ/50 thirds cell, λ/20 cells at f0 + fc
		expect(script).toContain("envnum('ER', c0/(f0+fc)/unit/50)");
		expect(script).toContain("envnum('MAXC', c0/(f0+fc)/unit/20)");
	});

	it('drops the plots, the field dump and the far-field box, and runs the engine on one thread', () => {
		const script = headlessScript(tutorial!);
		for (const gone of ['CSXGeomPlot', 'AddDump', 'CreateNF2FFBox', 'plotRefl', 'figure']) expect(script).not.toContain(gone);
		expect(script).toContain("RunOpenEMS(Sim_Path, Sim_CSX, '--numThreads=1')");
		// the shipped file is left as it is
		expect(readFileSync(tutorial!, 'utf8')).toContain('CSXGeomPlot');
	});
});

describe('the engine tutorial edit', () => {
	it('refuses a file that is not the tutorial it was written for', () => {
		const dir = mkdtempSync(join(tmpdir(), 'fringefield-engine-reference-test-'));
		try {
			const notTutorial = join(dir, 'other.m');
			writeFileSync(notTutorial, "patch.width = 10;\nCSX = AddDump(CSX,'Hf', 'DumpType', 11);\n");
			expect(() => headlessScript(notTutorial)).toThrow(/patch\.width {2}= 32;.*not found/);
			const noCut = join(dir, 'no-cut.m');
			writeFileSync(noCut, 'patch.width  = 32;\n');
			expect(() => headlessScript(noCut)).toThrow(/not the openEMS 0\.0\.35 tutorial/);
		} finally {
			rmSync(dir, { recursive: true, force: true });
		}
	});
});
