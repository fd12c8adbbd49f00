// The document's mask coverage, legend and mounting holes: what it accepts and what it refuses, by path.
import { describe, expect, it } from 'vitest';
import { InputError, parseDesignInput, type DesignInputDocument } from '../../../src/lib/schemas';

const base: DesignInputDocument = { frequencyHz: 2.45e9, substrate: { relativePermittivity: 4.4, heightMm: 1.6 } };
const issuesOf = (doc: unknown) => {
	try {
		parseDesignInput(doc);
		return [];
	} catch (e) {
		if (!(e instanceof InputError)) throw e;
		return e.issues.map((i) => `${i.path}: ${i.message}`);
	}
};

describe('mask coverage, legend and mounting holes in the document', () => {
	it('keeps a document without them as it was: no mask, no legend, no holes', () => {
		const d = parseDesignInput(base);
		expect(d.solderMask).toBe(false);
		expect(d.maskCoverage).toBeUndefined();
		expect(d.legend).toBeUndefined();
		expect(d.mountingHoles).toBeUndefined();
	});

	it('accepts a covered mask with its εr and thickness, a legend with an order text and two holes', () => {
		const d = parseDesignInput({ ...base, solderMask: true, maskCoverage: 'covered', maskCover: { relativePermittivity: 3.6, thicknessUm: 25 }, legend: { orderText: 'fr4 1.6mm enig' }, mountingHoles: [{ xMm: 3, yMm: 3, diameterMm: 3.2 }, { xMm: 40, yMm: 3, diameterMm: 2.2 }] });
		expect(d.maskCover).toEqual({ relativePermittivity: 3.6, thicknessUm: 25 });
		expect(d.legend?.orderText).toBe('fr4 1.6mm enig');
	});

	it.each([
		// coverage without a mask to cover with
		{ doc: { ...base, maskCoverage: 'covered' }, path: 'maskCoverage', message: /needs solderMask: true/ },
		// a cover for an exposed patch
		{ doc: { ...base, solderMask: true, maskCoverage: 'exposed', maskCover: { thicknessUm: 20 } }, path: 'maskCover', message: /only maskCoverage "covered"/ },
		// a name of our own, not another word
		{ doc: { ...base, solderMask: true, maskCoverage: 'over' }, path: 'maskCoverage', message: /exposed|covered/ },
		// the covered sizing is for one single-layer element
		{ doc: { ...base, feed: 'edge', solderMask: true, maskCoverage: 'covered', array: { columns: 2 } }, path: 'maskCoverage', message: /single-layer element/ },
		// mask εr out of range
		{ doc: { ...base, solderMask: true, maskCoverage: 'covered', maskCover: { relativePermittivity: 12 } }, path: 'maskCover.relativePermittivity', message: /allowed range/ },
		// a character the legend font does not draw
		{ doc: { ...base, legend: { orderText: 'FR4 @ 1.6' } }, path: 'legend.orderText', message: /legend font/ },
		// too long for a legend line
		{ doc: { ...base, legend: { orderText: 'X'.repeat(33) } }, path: 'legend.orderText', message: /at most 32/ },
		// a hole too small to be a mounting hole
		{ doc: { ...base, mountingHoles: [{ xMm: 3, yMm: 3, diameterMm: 0.2 }] }, path: 'mountingHoles.0.diameterMm', message: /allowed range/ },
		// a hole without its position
		{ doc: { ...base, mountingHoles: [{ xMm: 3, diameterMm: 3 }] }, path: 'mountingHoles.0.yMm', message: /required/ },
		// more holes than a patch board takes
		{ doc: { ...base, mountingHoles: Array.from({ length: 9 }, () => ({ xMm: 3, yMm: 3, diameterMm: 3 })) }, path: 'mountingHoles', message: /at most 8/ },
		// an unknown key in the legend
		{ doc: { ...base, legend: { font: 'bold' } }, path: 'legend', message: /.+/ }
	])('refuses $path: $message', ({ doc, path, message }) => {
		const issues = issuesOf(doc);
		expect(issues.some((i) => i.startsWith(`${path}: `) && message.test(i)), issues.join(' | ')).toBe(true);
	});
});
