// The colour pairs our small text uses meet WCAG 2.2 SC 1.4.3 (contrast, minimum: 4.5:1), computed from the tokens
// in tailwind.config.ts with the WCAG 2.2 definitions of "relative luminance" and "contrast ratio".
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import config from '../../../tailwind.config';

const colours = config.theme.extend.colors as Record<string, Record<string, string>>;
const token = (name: string): string => (name === 'white' ? '#ffffff' : colours[name.split('-')[0]][name.split('-')[1]]);

function luminance(hex: string): number {
	const [r, g, b] = [1, 3, 5].map((i) => parseInt(hex.slice(i, i + 2), 16) / 255).map((c) => (c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4));
	return 0.2126 * r + 0.7152 * g + 0.0722 * b;
}

function contrastRatio(a: string, b: string): number {
	const [hi, lo] = [luminance(a), luminance(b)].sort((x, y) => y - x);
	return (hi + 0.05) / (lo + 0.05);
}

describe('small-text colour pairs', () => {
	it('computes the ratio WCAG gives for black on white (21:1)', () => {
		expect(contrastRatio('#000000', '#ffffff')).toBeCloseTo(21, 6);
	});

	// text colour, background: the pairs the pages use for captions, labels and header text
	it.each([
		['ground-600', 'white'], // captions and labels on cards
		['ground-600', 'ground-50'], // captions on the page background and table heads
		['ground-200', 'ground-800'], // header links and the team label
		['copper-200', 'ground-800'], // the role in the header
		['white', 'copper-600'], // primary buttons
		['white', 'copper-800'], // the error page's way back
		['copper-800', 'white'], // links
		['warning-700', 'warning-100'],
		['error-700', 'error-100'],
		['ok-700', 'ok-100']
	])('%s on %s reaches 4.5:1', (text, background) => {
		expect(contrastRatio(token(text), token(background))).toBeGreaterThanOrEqual(4.5);
	});

});

describe('page sources', () => {
	const svelteFiles = readdirSync('src', { recursive: true, encoding: 'utf8' }).filter((f) => f.endsWith('.svelte'));
	const offending = (pattern: RegExp) => svelteFiles.filter((f) => pattern.test(readFileSync(join('src', f), 'utf8')));

	// ground-400 text is 3.1:1 on white and 4.49:1 on the dark header (WCAG 2.2 SC 1.4.3 asks 4.5:1)
	it('use no ground-400 text', () => {
		expect(svelteFiles.length).toBeGreaterThan(10);
		expect(offending(/\btext-ground-400\b/)).toEqual([]);
	});

	// upper-case styling turns σ into Σ and mm into MM (common practice, no source)
	it('use no upper-case styling', () => {
		expect(offending(/\buppercase\b/)).toEqual([]);
	});
});
