// The bench workload: an 8×8 and a 32×32 array's Gerber, DXF and SVG files (no holes, so no drill file), sixteen times the elements.
import { describe, expect, it } from 'vitest';
import { buildArrayBenchFiles } from '../../../src/lib/design';

const count = (text: string, needle: string) => text.split(needle).length - 1;

describe('array bench files', () => {
	it('builds the 8×8 and the 32×32 arrays with every element on the top copper', async () => {
		const small = await buildArrayBenchFiles(8);
		const large = await buildArrayBenchFiles(32);
		expect(small.map((f) => f.name)).toEqual(['copper-top.gbr', 'copper-bottom.gbr', 'profile.gbr', 'drawing.dxf', 'drawing.svg', 'manifest.json'].map((n) => `bench-array-8x8-A.${n}`));
		const svg = (files: typeof small) => new TextDecoder().decode(files.find((f) => f.name.endsWith('.svg'))!.bytes);
		expect(count(svg(small), '-patch"')).toBe(64);
		expect(count(svg(large), '-patch"')).toBe(1024);
	});
});
