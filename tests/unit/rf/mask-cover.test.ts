// A solder mask over the patch: the covered εeff the sizing is told, and the patch it then sizes.
import { describe, expect, it } from 'vitest';
import { DEFAULT_MASK_RELATIVE_PERMITTIVITY, DEFAULT_MASK_THICKNESS_UM, analyzeMicrostrip, maskCoverPermittivities, sizingReport } from '../../../src/lib/rf';
import type { DesignInputDocument } from '../../../src/lib/schemas';
import { sizeDocument } from '../../fixtures/designs/size-document';

const fr4: DesignInputDocument = { name: 'Mask test', frequencyHz: 2.45e9, substrate: { relativePermittivity: 4.4, heightMm: 1.6, lossTangent: 0.02 } };
const lengthOf = (p: ReturnType<typeof sizeDocument>['patch']) => (p.kind === 'rectangular' || p.kind === 'nearly-square' ? p.lengthMm : p.kind === 'circular' ? 2 * p.radiusMm : p.sideMm);

describe('maskCoverPermittivities', () => {
	it('tends to εr under a very thick cover of the substrate’s own εr (a homogeneous dielectric carries a TEM wave, εeff = εr; Pozar, Microwave Engineering 4th ed., §3.8, from memory)', () => {
		for (const er of [2.2, 3.55, 4.4]) {
			const p = maskCoverPermittivities(37, 1.6, er, { relativePermittivity: er, thicknessMm: 1e6 });
			expect(p.coveredEffectivePermittivity).toBeCloseTo(er, 4);
			// and the substrate εr that gives it bare is the one whose Hammerstad–Jensen εeff at W/h is εr
			expect(analyzeMicrostrip({ widthMm: 37, heightMm: 1.6, relativePermittivity: p.equivalentSubstratePermittivity }).effectivePermittivity).toBeCloseTo(er, 5);
		}
	});

	it('is the bare Hammerstad–Jensen εeff for an air-thin cover, and grows with the mask’s thickness and εr', () => {
		const bare = analyzeMicrostrip({ widthMm: 37, heightMm: 1.6, relativePermittivity: 4.4 }).effectivePermittivity;
		expect(maskCoverPermittivities(37, 1.6, 4.4, { relativePermittivity: 3.8, thicknessMm: 0 }).coveredEffectivePermittivity).toBeCloseTo(bare, 12);
		const at = (thicknessMm: number, er = 3.8) => maskCoverPermittivities(37, 1.6, 4.4, { relativePermittivity: er, thicknessMm }).coveredEffectivePermittivity;
		expect(at(0.01)).toBeGreaterThan(bare);
		expect(at(0.03)).toBeGreaterThan(at(0.01));
		expect(at(0.02, 4.2)).toBeGreaterThan(at(0.02, 3.5));
	});
});

describe('sizeDocument() with the mask over the patch', () => {
	const bare = sizeDocument(fr4);
	const covered = sizeDocument({ ...fr4, solderMask: true, maskCoverage: 'covered' });

	it('sizes the patch on the covered εeff, keeps the width and shortens the length', () => {
		const c = covered.maskCover!;
		expect(c.relativePermittivity).toBe(DEFAULT_MASK_RELATIVE_PERMITTIVITY);
		expect(c.thicknessMm).toBeCloseTo(DEFAULT_MASK_THICKNESS_UM / 1000, 12);
		expect(c.assumed).toEqual({ relativePermittivity: true, thickness: true });
		expect(covered.effectivePermittivity).toBeCloseTo(c.coveredEffectivePermittivity, 6);
		expect(c.uncoveredEffectivePermittivity).toBeCloseTo(bare.effectivePermittivity, 9);
		expect(covered.patch.kind === 'rectangular' && bare.patch.kind === 'rectangular' && covered.patch.widthMm).toBeCloseTo(bare.patch.kind === 'rectangular' ? bare.patch.widthMm : 0, 9);
		expect(lengthOf(covered.patch)).toBeLessThan(lengthOf(bare.patch));
		expect(c.uncoveredResonantSizeMm).toBeCloseTo(lengthOf(bare.patch), 9);
	});

	it('moves a 20 µm mask’s patch by well under 1 % on 1.6 mm FR-4 (common practice, no source: thin masks shift a patch by a fraction of a per cent)', () => {
		const shift = 1 - lengthOf(covered.patch) / lengthOf(bare.patch);
		expect(shift).toBeGreaterThan(0);
		expect(shift).toBeLessThan(0.01);
	});

	it('keeps the document as the stored input and reports the cover', () => {
		expect(covered.input.substrate.relativePermittivity).toBe(4.4);
		expect(covered.input.maskCoverage).toBe('covered');
		expect(sizingReport(covered).maskCover).toEqual(covered.maskCover);
		expect(sizingReport(bare).maskCover).toBeUndefined();
	});

	it('takes the stated mask εr and thickness and says they are not assumed', () => {
		const s = sizeDocument({ ...fr4, shape: 'circular', feed: 'probe', solderMask: true, maskCoverage: 'covered', maskCover: { relativePermittivity: 3.5, thicknessUm: 30 } });
		expect(s.maskCover).toMatchObject({ relativePermittivity: 3.5, thicknessMm: 0.03, assumed: { relativePermittivity: false, thickness: false } });
		expect(lengthOf(s.patch)).toBeLessThan(lengthOf(sizeDocument({ ...fr4, shape: 'circular', feed: 'probe' }).patch));
	});

	it('leaves an exposed mask (and no mask) sized as before', () => {
		expect(sizeDocument({ ...fr4, solderMask: true, maskCoverage: 'exposed' }).patch).toEqual(bare.patch);
		expect(sizeDocument({ ...fr4, solderMask: true }).maskCover).toBeUndefined();
	});
});
