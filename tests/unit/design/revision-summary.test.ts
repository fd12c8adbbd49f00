import { describe, expect, it } from 'vitest';
import { revisionSummary, sizeDocument } from '../../../src/lib/design';

// A 2.3765 GHz probe-fed patch on εr 4.68666 (demo data with deliberately long figures).
const doc = { frequencyHz: 2.3765e9, shape: 'rectangular', feed: 'probe', substrate: { relativePermittivity: 4.68666, heightMm: 1.6, lossTangent: 0.02 } };

describe('revisionSummary', () => {
	const outcome = sizeDocument(doc);
	if (!outcome.ok) throw new Error('the demo design must size');
	const { input, sized } = outcome;
	const p = sized.patch as { widthMm: number; lengthMm: number };

	it('names the shape and feed, and gives GHz and εr sensible figures', () => {
		const line = revisionSummary(input, sized);
		expect(line).toBe(`2.377 GHz · Rectangular · Coaxial probe feed · ${p.widthMm.toFixed(2)} × ${p.lengthMm.toFixed(2)} mm · εr 4.69`);
		expect(line).not.toMatch(/ rectangular,|4\.68666|2\.3765/); // not the raw id, nor the long figures
	});

	// mil = mm / 0.0254 (NIST SP 811 B.9)
	it('gives the patch size in mil for a person in mil', () => {
		const line = revisionSummary(input, sized, { length: 'mil', copper: 'um' });
		expect(line).toContain(`${(p.widthMm / 0.0254).toFixed(1)} × ${(p.lengthMm / 0.0254).toFixed(1)} mil`);
		expect(line).not.toContain(' mm');
	});
});
