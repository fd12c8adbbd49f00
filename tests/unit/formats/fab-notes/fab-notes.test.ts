// Fab notes filled from the template: every placeholder replaced, stack and drill table from the artwork.
import { describe, expect, it } from 'vitest';
import { buildArtwork } from '../../../../src/lib/artwork';
import { createExportMeta } from '../../../../src/lib/formats/export-meta';
import { buildFabNotes, fillTemplate } from '../../../../src/lib/formats/fab-notes';
import { sizedCase } from '../../../fixtures/designs/design-cases';

const meta = createExportMeta({ designName: 'Sunroof GNSS', revisionLabel: 'B', revisionDate: '2026-11-20' });

describe('fab notes', () => {
	it('fills the template with stack-up, laminate, copper weight, drills and cautions', () => {
		const sized = sizedCase('rectangular', 'probe');
		const notes = buildFabNotes(buildArtwork(sized), meta, { fileNames: ['a.gbr'], warnings: ['a sizing caution'], solderMask: false });
		expect(notes).not.toMatch(/\{\{\w+\}\}/);
		expect(notes).toContain('Revision B, 2026-11-20');
		expect(notes).toContain('εr 3.55');
		// 35 µm ≈ 1 oz/ft² (trade convention, from memory)
		expect(notes).toContain('35 µm (1.01 oz/ft²)');
		expect(notes).toContain('PTH  1.3 mm finished hole, 1 hole(s), plated through');
		expect(notes).toContain('a sizing caution');
		expect(notes).toContain('   - a.gbr');
		expect(notes).toContain('HASL');
	});

	it('says so when a design has no holes', () => {
		const notes = buildFabNotes(buildArtwork(sizedCase('rectangular', 'edge')), meta, { fileNames: [], warnings: [], solderMask: true });
		expect(notes).toContain('None: this design has no holes.');
	});

	it('refuses a template placeholder without a value', () => {
		expect(() => fillTemplate('{{missing}}', {})).toThrow(/missing/);
	});
});
