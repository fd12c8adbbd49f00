// Dimension overrides: the sizing honours explicit dimensions, describes the overridden patch and keeps the formula's values visible.
import { describe, expect, it } from 'vitest';
import { buildArtwork } from '../../../src/lib/artwork';
import { InputError } from '../../../src/lib/schemas';
import { sizeDocument } from '../../fixtures/designs/size-document';

const rect = { frequencyHz: 2.45e9, feed: 'inset', substrate: { relativePermittivity: 4.3, heightMm: 1.6 } } as const;

describe('dimension overrides', () => {
	it('leaves a document without overrides exactly as before (no formulaValues)', () => {
		expect(sizeDocument(rect).formulaValues).toBeUndefined();
		expect(sizeDocument({ ...rect, overrides: {} }).formulaValues).toBeUndefined();
	});

	it('uses an overridden length and inset depth, and shows the formula values beside them', () => {
		const plain = sizeDocument(rect);
		const tuned = sizeDocument({ ...rect, overrides: { lengthMm: 28.5, insetDepthMm: 4.5 } });
		expect(tuned.patch).toMatchObject({ kind: 'rectangular', lengthMm: 28.5 });
		expect(tuned.feed).toMatchObject({ kind: 'inset', insetDepthMm: 4.5 });
		expect(tuned.formulaValues!.lengthMm).toBe((plain.patch as { lengthMm: number }).lengthMm);
		// the formula's own depth (for the overridden patch) is kept beside the overridden one
		expect(tuned.formulaValues!.insetDepthMm).toBeGreaterThan(4.5);
		// L + 2ΔL with ΔL unchanged (Hammerstad's ΔL depends on W and h only; Balanis, Antenna Theory 4th ed., eq. 14-2; from memory)
		expect(tuned.effectiveLengthMm! - 28.5).toBeCloseTo(2 * plain.fringeExtensionMm!, 9);
		// the artwork draws the overridden patch
		const dims = buildArtwork(tuned).dimensions;
		expect(dims.find((d) => d.id === 'patch-length')!.valueMm).toBeCloseTo(28.5, 9);
	});

	it('recomputes a circular patch from an overridden radius and probe offset', () => {
		const doc = { frequencyHz: 1.57542e9, shape: 'circular', feed: 'probe', substrate: { relativePermittivity: 3.38, heightMm: 1.524 } } as const;
		const plain = sizeDocument(doc);
		const tuned = sizeDocument({ ...doc, overrides: { radiusMm: 26, probeOffsetMm: 8 } });
		expect(tuned.patch).toMatchObject({ kind: 'circular', radiusMm: 26 });
		expect(tuned.feed).toMatchObject({ kind: 'probe', offsetYMm: 8 });
		expect(tuned.formulaValues!.radiusMm).toBe((plain.patch as { radiusMm: number }).radiusMm);
		// a larger radius lowers the cavity-model resonance: the edge resistance changes with it
		expect(tuned.edgeResistanceOhm).not.toBe(plain.edgeResistanceOhm);
	});

	it.each([
		[{ ...rect, shape: 'circular', feed: 'probe', overrides: { lengthMm: 30 } }, 'overrides.lengthMm'],
		[{ ...rect, overrides: { radiusMm: 10 } }, 'overrides.radiusMm'],
		[{ ...rect, overrides: { probeOffsetMm: 3 } }, 'overrides.probeOffsetMm'],
		[{ ...rect, feed: 'probe', overrides: { insetDepthMm: 3 } }, 'overrides.insetDepthMm'],
		[{ ...rect, patchWidthMm: 30, overrides: { widthMm: 31 } }, 'overrides.widthMm'],
		[{ ...rect, overrides: { lengthMm: -1 } }, 'overrides.lengthMm']
	])('rejects an override that does not apply (%#) at %s', (doc, path) => {
		try {
			sizeDocument(doc);
			expect.unreachable();
		} catch (err) {
			expect(err).toBeInstanceOf(InputError);
			expect((err as InputError).issues.map((i) => i.path)).toContain(path);
		}
	});
});
