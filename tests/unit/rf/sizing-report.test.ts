import { describe, expect, it } from 'vitest';
import { sizingReport } from '../../../src/lib/rf/sizing-report';
import { sizeDocument } from '../../fixtures/designs/size-document';

describe('sizingReport', () => {
	it('puts input first, every quantity flat with a unit in its key, estimates and warnings last', () => {
		const r = sizingReport(sizeDocument({ frequencyHz: 2.45e9, feed: 'quarter-wave', substrate: { relativePermittivity: 4.4, heightMm: 1.6 } }));
		const keys = Object.keys(r);
		expect(keys[0]).toBe('input');
		expect(keys.slice(-2)).toEqual(['estimates', 'warnings']);
		for (const k of ['transformerImpedanceOhm', 'transformerWidthMm', 'transformerLengthMm', 'feedLineWidthMm', 'groundWidthMm']) expect(typeof r[k]).toBe('number');
		expect(r.insetDepthMm).toBeUndefined();
	});

	it('reports the radius of a circular patch and the cut of a truncated one', () => {
		const c = sizingReport(sizeDocument({ frequencyHz: 2.45e9, shape: 'circular', feed: 'probe', substrate: { relativePermittivity: 4.4, heightMm: 1.6 } }));
		expect(typeof c.patchRadiusMm).toBe('number');
		expect(c.patchWidthMm).toBeUndefined();
		const t = sizingReport(sizeDocument({ frequencyHz: 2.45e9, shape: 'truncated-corner', handedness: 'lhcp', substrate: { relativePermittivity: 4.4, heightMm: 1.6 } }));
		expect(t.truncatedDiagonal).toBe('falling');
		expect(typeof t.truncationLegMm).toBe('number');
	});
});
