// The preview's layer styles and counts: every copper of a stack named by number and contents, ground drawn first, arrays counted.
import { describe, expect, it } from 'vitest';
import { buildArtwork } from '../../../src/lib/artwork';
import { previewCounts, previewKeyStep, previewLayerStyles } from '../../../src/lib/components/preview-paths';
import { designDocument } from '../../fixtures/designs/design-cases';
import { layeredCases } from '../../fixtures/designs/layered-cases';
import { sizeDocument } from '../../fixtures/designs/size-document';

const artworkOf = (name: string) => buildArtwork(sizeDocument(layeredCases.find((c) => c.name === name)!.doc));

describe('preview layer styles', () => {
	it('keep the two names of a two-copper board and draw the ground under the top copper', () => {
		const styles = previewLayerStyles(buildArtwork(sizeDocument(designDocument('rectangular', 'inset'))).layers);
		expect(styles['copper-top'].label).toBe('Top copper');
		expect(styles['copper-bottom'].label).toBe('Ground');
		expect(styles['copper-bottom'].order).toBeLessThan(styles['copper-top'].order);
	});

	// WCAG 2.2 SC 1.4.1 (use of colour): ground and copper differ by pattern, not by hue alone
	it('hatch every ground plane and keep every other copper solid', () => {
		const styles = previewLayerStyles(artworkOf('stacked parasitic patch').layers);
		expect([styles['copper-top'].pattern, styles['copper-inner-1'].pattern, styles['copper-bottom'].pattern]).toEqual(['solid', 'solid', 'hatched']);
		const two = previewLayerStyles(buildArtwork(sizeDocument(designDocument('rectangular', 'inset'))).layers);
		expect([two['copper-top'].pattern, two['copper-bottom'].pattern]).toEqual(['solid', 'hatched']);
	});

	it('name each copper of an aperture-coupled stack by number and contents, inner layer included', () => {
		const styles = previewLayerStyles(artworkOf('aperture-coupled patch').layers);
		expect([styles['copper-top'].label, styles['copper-inner-1'].label, styles['copper-bottom'].label]).toEqual(['L1 patch', 'L2 ground', 'L3 feed']);
		// the ground first, then the feed below it, the patch last: the feed under the slot stays visible
		expect(styles['copper-inner-1'].order).toBeLessThan(styles['copper-bottom'].order);
		expect(styles['copper-bottom'].order).toBeLessThan(styles['copper-top'].order);
	});

	it('name a parasitic stack and a proximity-coupled stack by what each copper carries', () => {
		const parasitic = previewLayerStyles(artworkOf('stacked parasitic patch').layers);
		expect([parasitic['copper-top'].label, parasitic['copper-inner-1'].label, parasitic['copper-bottom'].label]).toEqual(['L1 parasitic patch', 'L2 patch + feed', 'L3 ground']);
		const proximity = previewLayerStyles(artworkOf('proximity-coupled patch').layers);
		expect(proximity['copper-inner-1'].label).toBe('L2 feed');
	});
});

describe('preview counts', () => {
	it('count the patches and the corporate feed of arrays', () => {
		expect(previewCounts(artworkOf('1×4 inset array').layers)).toMatchObject({ patches: 4, parasitics: 0 });
		expect(previewCounts(artworkOf('1×4 inset array').layers).networkPieces).toBeGreaterThan(0);
		expect(previewCounts(artworkOf('4×4 inset array').layers).patches).toBe(16);
		expect(previewCounts(artworkOf('aperture-coupled patch').layers)).toEqual({ patches: 1, parasitics: 0, networkPieces: 0 });
	});
});

// WCAG 2.2 SC 2.1.1 (keyboard): everything the pointer does to the preview, the keys do too
describe('preview keys', () => {
	const box = { x: 0, y: 0, w: 100, h: 50 };

	it('pan a tenth of the window per arrow press', () => {
		expect(previewKeyStep('ArrowRight', box)).toEqual({ x: 10, y: 0, w: 100, h: 50 });
		expect(previewKeyStep('ArrowUp', box)).toEqual({ x: 0, y: -5, w: 100, h: 50 });
	});

	it('zoom about the centre with + and −, and reset with 0', () => {
		const inOnce = previewKeyStep('+', box) as { x: number; y: number; w: number; h: number };
		expect(inOnce.w).toBeCloseTo(100 / 1.4, 9);
		expect(inOnce.x + inOnce.w / 2).toBeCloseTo(50, 9);
		expect((previewKeyStep('-', box) as { w: number }).w).toBeCloseTo(140, 9);
		expect(previewKeyStep('0', box)).toBe('fit');
	});

	it('leave other keys to the page (Tab must still move focus)', () => {
		expect(previewKeyStep('Tab', box)).toBeNull();
		expect(previewKeyStep('a', box)).toBeNull();
	});
});
