// readFabView on hand-written files (Gerber spec constructs we do not write ourselves but a fab would read).
import { describe, expect, it } from 'vitest';
import { readFabView } from '../../../../src/lib/formats/readback';
import { parseCoordinateMm } from '../../../../src/lib/formats/readback/parse-coordinate';

const gerber = (body: string, fn = 'Copper,L1,Top') => `%TF.FileFunction,${fn}*%\n%FSLAX46Y46*%\n%MOMM*%\n${body}\nM02*\n`;

describe('parseCoordinateMm', () => {
	it.each([
		// 4.6 leading zeros omitted: 12.5 mm (Gerber spec §4.2.1 example form)
		['12500000', { format: [4, 6], zeroSuppression: 'leading', units: 'mm' }, 12.5],
		// 4.6 trailing zeros omitted: pad to ten digits
		['00125', { format: [4, 6], zeroSuppression: 'trailing', units: 'mm' }, 12.5],
		// negative
		['-500000', { format: [4, 6], zeroSuppression: 'leading', units: 'mm' }, -0.5],
		// a decimal point is read as written, inches converted (25.4 mm per inch, exact)
		['1.5', { format: [2, 4], zeroSuppression: 'leading', units: 'in' }, 38.1]
	] as const)('%s in %j is %s mm', (text, nf, mm) => {
		expect(parseCoordinateMm(text, { ...nf, format: [...nf.format] as [number, number] })).toBeCloseTo(mm, 12);
	});
});

describe('readFabView', () => {
	it('draws a stroke with a round pen as copper: 10 mm × 0.2 mm plus two half discs', () => {
		const view = readFabView([{ name: 'a.gbr', text: gerber('%ADD10C,0.2*%\nD10*\nX0Y0D02*\nG01*\nX10000000Y0D01*') }]);
		expect(view.problems).toEqual([]);
		const [layer] = view.layers;
		expect(layer.key).toBe('copper-L1');
		// flattened arcs sit inside the true circle: within 0.01 % here
		expect(layer.areaMm2).toBeCloseTo(10 * 0.2 + Math.PI * 0.01, 3);
		expect(layer.bounds).toMatchObject({ minXMm: expect.closeTo(-0.1, 6), maxXMm: expect.closeTo(10.1, 6) });
	});

	it('subtracts a clear flash from a dark region (LPC)', () => {
		const body = 'G36*\nX0Y0D02*\nG01*\nX4000000Y0D01*\nX4000000Y4000000D01*\nX0Y4000000D01*\nX0Y0D01*\nG37*\n%LPC*%\n%ADD10C,2*%\nD10*\nX2000000Y2000000D03*';
		const [layer] = readFabView([{ name: 'b.gbr', text: gerber(body) }]).layers;
		expect(layer.areaMm2).toBeCloseTo(16 - Math.PI, 3);
		expect(layer.polygons[0].holes).toHaveLength(1);
	});

	it('refuses what it cannot read rather than guessing', () => {
		const view = readFabView([
			{ name: 'macro.gbr', text: gerber('%AMBOX*21,1,1,1,0,0,0*%\n%ADD10BOX*%') },
			{ name: 'anon.gbr', text: '%FSLAX46Y46*%\n%MOMM*%\nM02*\n' },
			{ name: 'route.drl', text: 'M48\n; #@! TF.FileFunction,Plated,1,2,PTH\nMETRIC\nT01C1.0\nM95\nT01\nG00X1.0Y1.0\nM15\nG01X2.0Y2.0\nM16\nM30\n' }
		]);
		const checks = view.problems.map((p) => [p.fileName, p.check]);
		expect(checks).toContainEqual(['macro.gbr', 'file-unsupported']);
		expect(checks).toContainEqual(['anon.gbr', 'file-unidentified']);
		expect(checks).toContainEqual(['route.drl', 'file-unsupported']);
	});
});
