// The array-pattern file: the gain budget in new revisions, and the very bytes of old ones (stored before the budget) kept.
import { describe, expect, it } from 'vitest';
import { buildArrayPatternDocument, createExportMeta, serializeArrayPattern } from '../../../../src/lib/formats';
import { type SizedDesign } from '../../../../src/lib/rf';
import { layeredCases } from '../../../fixtures/designs/layered-cases';
import { sizeDocument } from '../../../fixtures/designs/size-document';

const meta = createExportMeta({ designName: 'Layered demo', revisionLabel: 'A', revisionDate: '2026-12-02' });
const sized = sizeDocument(layeredCases.find((c) => c.name === '4×4 inset array')!.doc);

describe('array-pattern file', () => {
	it('states the gain budget: gainDbi is element gain + 10·log10 N − feed loss − mismatch loss', () => {
		const doc = JSON.parse(serializeArrayPattern(buildArrayPatternDocument(sized, meta)!));
		const b = doc.gainBreakdown;
		expect(b.arrayGainDb).toBeCloseTo(10 * Math.log10(16), 12);
		expect(b.feedLossDb).toBeGreaterThan(0);
		expect(doc.gainDbi).toBeCloseTo(b.elementGainDbi + b.arrayGainDb - b.feedLossDb - b.mismatchLossDb, 12);
		expect(doc.note).toContain('line loss');
	});

	it('writes a revision stored before the gain budget byte for byte as before (no gainBreakdown, the old note)', () => {
		const { gainBreakdown: _dropped, ...oldFactor } = sized.array!.factor;
		void _dropped;
		const old = { ...sized, array: { ...sized.array!, factor: { ...oldFactor, gainDbi: 14.5 } } } as unknown as SizedDesign;
		const a = old.array!;
		// the file as the builder wrote it before the budget: same keys, same order, same note
		const before = {
			format: 'fringefield-array-pattern',
			formatVersion: 1,
			design: { name: meta.designName, slug: meta.designSlug, revision: meta.revisionLabel, revisionDate: meta.revisionDate, software: `Fringefield ${meta.softwareVersion}` },
			frequencyHz: old.frequencyHz,
			columns: a.columns,
			rows: a.rows,
			spacingXWavelengths: a.spacingXWavelengths,
			spacingYWavelengths: a.spacingYWavelengths,
			scanAngleDeg: a.scanAngleDeg,
			gratingLobeLimitWavelengths: a.gratingLobeLimitWavelengths,
			arrayFactorDirectivityDbi: a.factor.arrayFactorDirectivityDbi,
			gainDbi: 14.5,
			halfPowerBeamwidthXzDeg: a.factor.halfPowerBeamwidthXzDeg,
			halfPowerBeamwidthYzDeg: a.factor.halfPowerBeamwidthYzDeg,
			note: 'Array factor of isotropic elements; gain = element gain estimate + 10·log10(element count), without mutual coupling or feed-network loss. Estimates, not measurements.',
			pattern: a.factor.pattern
		};
		expect(serializeArrayPattern(buildArrayPatternDocument(old, meta)!)).toBe(JSON.stringify(before) + '\n');
	});
});
