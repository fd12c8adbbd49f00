// Sizing with stacks, coupled feeds, a parasitic patch and arrays: first-pass rules, series permittivity, corporate-feed lines, old documents untouched.
import { describe, expect, it } from 'vitest';
import { SLOT_LENGTH_PATCH_SHARE, SLOT_WIDTH_LENGTH_SHARE, combineDielectrics, quarterGuidedWavelengthMm } from '../../../src/lib/rf';
import { InputError } from '../../../src/lib/schemas';
import { designDocument } from '../../fixtures/designs/design-cases';
import { layeredDocument, parasiticStack, threeCopperStack } from '../../fixtures/designs/layered-cases';
import { sizeDocument } from '../../fixtures/designs/size-document';

describe('sizing beyond one substrate', () => {
	it('combines layers between two coppers in series: Σh / Σ(h/εr) (layered capacitor)', () => {
		const g = combineDielectrics([
			{ heightMm: 1, relativePermittivity: 2, lossTangent: 0.001 },
			{ heightMm: 1, relativePermittivity: 4, lossTangent: 0.004 }
		]);
		expect(g.heightMm).toBe(2);
		expect(g.relativePermittivity).toBeCloseTo(2 / (0.5 + 0.25), 12);
		expect(g.lossTangent).toBeCloseTo((0.001 / 2 + 0.004 / 4) / 0.75, 12);
	});

	it('sizes a two-copper stack of one core like the same substrate given alone', () => {
		const plain = sizeDocument(designDocument('rectangular', 'inset'));
		const stacked = sizeDocument(designDocument('rectangular', 'inset', { stack: [{ kind: 'copper' }, { kind: 'dielectric', relativePermittivity: 3.55, heightMm: 1.524, lossTangent: 0.0027 }, { kind: 'copper' }] }));
		expect(stacked.patch).toEqual(plain.patch);
		expect(stacked.feed).toEqual(plain.feed);
		expect(stacked.layerStack?.length).toBe(3);
	});

	it('starts the aperture-coupled feed from the published first-pass rules: slot ½L × L/20, stub λg/4 of the feed line', () => {
		const s = sizeDocument(layeredDocument({ feed: 'aperture-coupled', stack: [...threeCopperStack] }));
		if (s.feed.kind !== 'aperture-coupled' || s.patch.kind !== 'rectangular') throw new Error('expected aperture-coupled rectangular');
		expect(s.feed.slotLengthMm).toBeCloseTo(SLOT_LENGTH_PATCH_SHARE * s.patch.lengthMm, 9);
		expect(s.feed.slotWidthMm).toBeCloseTo(SLOT_WIDTH_LENGTH_SHARE * s.feed.slotLengthMm, 9);
		expect(s.feed.stubLengthMm).toBeCloseTo(quarterGuidedWavelengthMm(2.45e9, s.feed.line.effectivePermittivity), 9);
		// the patch is sized on the upper group (core + bonding film), the line on the lower core
		const upper = combineDielectrics([threeCopperStack[1], threeCopperStack[2]]);
		const alone = sizeDocument(layeredDocument({ feed: 'edge', substrate: { relativePermittivity: upper.relativePermittivity, heightMm: upper.heightMm, lossTangent: upper.lossTangent } }));
		expect(s.patch).toEqual(alone.patch);
		expect(s.warnings.map((w) => w.code)).toContain('first-pass-coupling');
	});

	it('takes the slot sizes the document gives', () => {
		const s = sizeDocument(layeredDocument({ feed: 'aperture-coupled', stack: [...threeCopperStack], slot: { lengthMm: 12, widthMm: 1.1, stubLengthMm: 9 } }));
		expect(s.feed).toMatchObject({ slotLengthMm: 12, slotWidthMm: 1.1, stubLengthMm: 9 });
	});

	it('runs a proximity-coupled line to the patch centre by default and refuses an overlap past the patch', () => {
		const s = sizeDocument(layeredDocument({ feed: 'proximity-coupled', stack: [...threeCopperStack] }));
		if (s.feed.kind !== 'proximity-coupled' || s.patch.kind !== 'rectangular') throw new Error('expected proximity-coupled rectangular');
		expect(s.feed.overlapMm).toBeCloseTo(s.patch.lengthMm / 2, 9);
		expect(() => sizeDocument(layeredDocument({ feed: 'proximity-coupled', stack: [...threeCopperStack], proximity: { overlapMm: 500 } }))).toThrow(InputError);
	});

	it('makes the parasitic patch ×1.07 the driven one by default and warns when the spacer is far from 0.04–0.12 λ0', () => {
		const s = sizeDocument(layeredDocument({ feed: 'inset', stack: [...parasiticStack], parasitic: {} }));
		if (s.parasitic?.patch.kind !== 'rectangular' || s.patch.kind !== 'rectangular') throw new Error('expected rectangular');
		expect(s.parasitic.patch.widthMm / s.patch.widthMm).toBeCloseTo(1.07, 12);
		expect(s.parasitic.spacingMm).toBe(6);
		expect(s.warnings.map((w) => w.code)).not.toContain('parasitic-spacing');
		const thin = [parasiticStack[0], { kind: 'dielectric' as const, relativePermittivity: 1.07, heightMm: 0.5 }, ...parasiticStack.slice(2)];
		expect(sizeDocument(layeredDocument({ feed: 'inset', stack: thin, parasitic: {} })).warnings.map((w) => w.code)).toContain('parasitic-spacing');
	});

	it('sizes the corporate feed: Z0 lines, √2·Z0 λg/4 transformers to 2·Z0 at each junction, log2 of the count in levels', () => {
		const s = sizeDocument(layeredDocument({ feed: 'inset', array: { columns: 8, rows: 4 } }));
		const n = s.array!.network;
		expect(n.line.impedanceOhm).toBeCloseTo(50, 6);
		expect(n.transformer.impedanceOhm).toBeCloseTo(50 * Math.SQRT2, 6);
		expect(n.branchImpedanceOhm).toBe(100);
		// two arms of 2·Z0 in parallel present Z0 to the trunk
		expect((n.branchImpedanceOhm * n.branchImpedanceOhm) / (2 * n.branchImpedanceOhm)).toBe(50);
		expect(n.transformer.lengthMm).toBeCloseTo(quarterGuidedWavelengthMm(2.45e9, n.transformer.effectivePermittivity), 9);
		expect(n.junctionLevels).toBe(5);
		expect(s.array!.elementCount).toBe(32);
		expect(s.array!.factor.pattern.anglesDeg.length).toBe(181);
		expect(Math.max(...s.array!.factor.pattern.xzDb)).toBeCloseTo(0, 6);
	});

	it('leaves a single-layer document without any of the new keys', () => {
		const s = sizeDocument(designDocument('rectangular', 'probe'));
		for (const key of ['layerStack', 'parasitic', 'array']) expect(key in s).toBe(false);
		for (const key of ['stack', 'slot', 'proximity', 'parasitic', 'array']) expect(key in s.input).toBe(false);
	});
});
