// The drawing sheet both drawing writers draw: for every shape, feed and array, and over random designs (fast-check),
// no two labels overlap and every label lies on the sheet; sizes to the fab profile's resolution; the title block.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { boxesOverlap, buildArtwork } from '../../../../src/lib/artwork';
import { createExportMeta } from '../../../../src/lib/formats/export-meta';
import { buildDrawingSheet, drawingResolutionMm, FIRST_PASS_CAUTION, overlappingLabels, sheetLabels, type DrawingSheet } from '../../../../src/lib/formats/drawing-sheet';
import { STANDARD_QUICK_TURN_PROFILE, type DesignInputDocument } from '../../../../src/lib/schemas';
import { allShapeFeedCases, sizedCase } from '../../../fixtures/designs/design-cases';
import { layeredCases, layeredDocument, threeCopperStack } from '../../../fixtures/designs/layered-cases';
import { randomSingleDesigns, tryBuildArtwork } from '../../../fixtures/designs/random-designs';
import { sizeDocument } from '../../../fixtures/designs/size-document';

const meta = createExportMeta({ designName: 'Sunroof GNSS', revisionLabel: 'B', revisionDate: '2026-11-20' });

function expectReadable(sheet: DrawingSheet): void {
	expect(overlappingLabels(sheet)).toEqual([]);
	const e = sheet.extent;
	for (const l of sheetLabels(sheet)) {
		expect(l.box.minXMm, l.text).toBeGreaterThanOrEqual(e.minXMm);
		expect(l.box.minYMm, l.text).toBeGreaterThanOrEqual(e.minYMm);
		expect(l.box.maxXMm, l.text).toBeLessThanOrEqual(e.maxXMm);
		expect(l.box.maxYMm, l.text).toBeLessThanOrEqual(e.maxYMm);
	}
	// every dimension's label at the sheet's decimals, no more
	const sized = new RegExp(`^\\S+ -?\\d+\\.\\d{${sheet.decimals}}$`);
	for (const d of sheet.dimensions) expect(d.label.text).toMatch(sized);
}

describe('buildDrawingSheet', () => {
	it.each(allShapeFeedCases)('lays out a $shape / $feed drawing with no overlapping label, all on the sheet', ({ shape, feed }) => {
		expectReadable(buildDrawingSheet(buildArtwork(sizedCase(shape, feed, { solderMask: true })), meta));
	});

	it.each(layeredCases)('lays out the $name drawing with no overlapping label, all on the sheet', ({ doc }) => {
		expectReadable(buildDrawingSheet(buildArtwork(sizeDocument(doc)), meta));
	});

	it('holds for random designs of every shape and feed, single and in arrays (fast-check)', () => {
		const single = randomSingleDesigns(fc.string({ minLength: 1, maxLength: 40 }).map((s) => s.replace(/[\u0000-\u001f\u007f]/g, ' ').trim() || 'x'));
		const arrays = fc
			.record({
				feed: fc.constantFrom('inset' as const, 'quarter-wave' as const, 'edge' as const, 'aperture-coupled' as const, 'proximity-coupled' as const),
				columns: fc.integer({ min: 1, max: 3 }),
				rows: fc.integer({ min: 1, max: 3 }),
				frequencyHz: fc.double({ min: 1.5e9, max: 6e9, noNaN: true })
			})
			.map(({ feed, columns, rows, frequencyHz }) =>
				layeredDocument({ feed, frequencyHz, array: { columns, rows }, ...(feed === 'aperture-coupled' || feed === 'proximity-coupled' ? { stack: [...threeCopperStack] } : {}) } as Partial<DesignInputDocument>)
			);
		let built = 0;
		fc.assert(
			fc.property(fc.oneof(single, arrays), fc.constantFrom(0.1, 0.01, 0.001), (doc, resolutionMm) => {
				const artwork = tryBuildArtwork(doc);
				if (!artwork) return;
				built += 1;
				const m = createExportMeta({ designName: doc.name ?? 'x', revisionLabel: 'A', revisionDate: '2026-12-01' });
				expectReadable(buildDrawingSheet(artwork, m, { resolutionMm }));
			}),
			{ numRuns: 60, seed: 17 }
		);
		// most random documents build: the property was checked, not skipped
		expect(built).toBeGreaterThan(30);
	});

	it('prints sizes to the resolution it is given: 3 decimals at 0.001 mm, 1 at 0.1 mm', () => {
		const artwork = buildArtwork(sizedCase('rectangular', 'inset'));
		expect(buildDrawingSheet(artwork, meta, { resolutionMm: 0.001 }).dimensions.find((d) => d.id === 'patch-width')!.label.text).toMatch(/^W \d+\.\d{3}$/);
		expect(buildDrawingSheet(artwork, meta, { resolutionMm: 0.1 }).dimensions.find((d) => d.id === 'patch-width')!.label.text).toMatch(/^W \d+\.\d$/);
	});

	it('writes the title block from the revision meta: name, revision and date, units and scale, laminate, the caution', () => {
		const sized = sizedCase('circular', 'probe');
		const sheet = buildDrawingSheet(buildArtwork(sized), meta, { laminateName: 'Demo laminate 3.55' });
		const lines = sheet.titleBlock.labels.map((l) => l.text);
		expect(lines[0]).toBe('Sunroof GNSS');
		expect(lines).toContain('Revision B · 2026-11-20');
		expect(lines).toContain('Units mm · scale 1:1 · sizes to 0.01 mm');
		expect(lines.find((l) => l.startsWith('Laminate: Demo laminate 3.55, εr 3.55, tanδ 0.0027, h 1.52 mm'))).toBeDefined();
		expect(lines.find((l) => l.startsWith('Datum A: board lower-left corner; xp, yp'))).toBeDefined();
		expect(lines).toContain(FIRST_PASS_CAUTION);
		// the frame holds every line of the block
		for (const l of sheet.titleBlock.labels) {
			expect(l.box.minXMm).toBeGreaterThan(sheet.titleBlock.frame.minXMm);
			expect(l.box.maxXMm).toBeLessThan(sheet.titleBlock.frame.maxXMm);
			expect(l.box.minYMm).toBeGreaterThan(sheet.titleBlock.frame.minYMm);
			expect(l.box.maxYMm).toBeLessThan(sheet.titleBlock.frame.maxYMm);
		}
	});

	it('lists each dielectric of a three-copper stack on the laminate line, the bonding film marked', () => {
		const artwork = buildArtwork(sizeDocument(layeredCases.find((c) => c.name === 'aperture-coupled patch')!.doc));
		const laminate = buildDrawingSheet(artwork, meta).titleBlock.labels.find((l) => l.text.startsWith('Laminate'))!.text;
		expect(laminate).toBe('Laminate: εr 2.2, tanδ 0.0009, h 1.52 mm + εr 3, tanδ 0.003, h 0.10 mm (bond) + εr 3.55, tanδ 0.0027, h 0.51 mm, copper 35 µm');
	});

	it('puts datum A in the corner left of and below the board, clear of every dimension label', () => {
		const sheet = buildDrawingSheet(buildArtwork(sizedCase('rectangular', 'probe')), meta);
		expect(sheet.datum.label.text).toBe('A');
		expect(sheet.datum.label.box.maxXMm).toBeLessThan(0);
		expect(sheet.datum.label.box.maxYMm).toBeLessThan(0);
		for (const d of sheet.dimensions) expect(boxesOverlap(d.label.box, sheet.datum.label.box)).toBe(false);
	});
});

describe('drawingResolutionMm', () => {
	it('is the decimal place of the profile’s finest tolerance', () => {
		// built-in profile: ±0.05 mm etch and non-plated drill, ±0.075 mm plated drill → 0.01 mm
		expect(drawingResolutionMm(STANDARD_QUICK_TURN_PROFILE)).toBe(0.01);
		expect(drawingResolutionMm({ ...STANDARD_QUICK_TURN_PROFILE, etchToleranceMm: 0.005 })).toBe(0.001);
		expect(drawingResolutionMm({ ...STANDARD_QUICK_TURN_PROFILE, etchToleranceMm: 0.0254 })).toBe(0.01);
		expect(drawingResolutionMm({ ...STANDARD_QUICK_TURN_PROFILE, etchToleranceMm: 0.2, platedDrillToleranceMm: 0.2, nonPlatedDrillToleranceMm: 0.15 })).toBe(0.1);
	});

	it('falls back to 0.01 mm without a profile or when the profile states no tolerance, and never goes below 0.001 mm', () => {
		expect(drawingResolutionMm(undefined)).toBe(0.01);
		expect(drawingResolutionMm({ ...STANDARD_QUICK_TURN_PROFILE, etchToleranceMm: 0, platedDrillToleranceMm: 0, nonPlatedDrillToleranceMm: 0 })).toBe(0.01);
		expect(drawingResolutionMm({ ...STANDARD_QUICK_TURN_PROFILE, etchToleranceMm: 0.0001 })).toBe(0.001);
	});
});
