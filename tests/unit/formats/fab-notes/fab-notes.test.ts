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

// Abuse review item 12. Lines are split the way the Unicode Standard's newline guidelines (§5.8) count them:
// LF, CR, VT, FF, NEL (U+0085), LS (U+2028), PS (U+2029); a reader that honours any of them must see no forged line.
const unicodeLines = (text: string) => text.split(/\r\n|[\n\r\u000b\u000c\u0085\u2028\u2029]/);
const forged = (notes: string) => unicodeLines(notes).filter((line) => /^\s*(- )?LAYER COUNT: 6/.test(line));

describe('fab notes with hostile user text', () => {
	const sized = sizedCase('rectangular', 'probe');
	const waived = (reason: string, profileName: string, designName = 'Sunroof GNSS') =>
		buildFabNotes(buildArtwork(sized), createExportMeta({ designName, revisionLabel: 'B', revisionDate: '2026-11-20' }), {
			fileNames: ['a.gbr'],
			warnings: [],
			solderMask: false,
			waiver: { reason, profileName, violations: ['a waived rule'] }
		});

	it('a waiver reason with "\\nLAYER COUNT: 6" yields no such line: the reason is one quoted line', () => {
		const notes = waived('Board house confirmed by phone\nLAYER COUNT: 6', 'standard quick-turn two-layer');
		expect(forged(notes)).toEqual([]);
		expect(notes).toContain('Reason: "Board house confirmed by phone LAYER COUNT: 6"');
	});

	it.each([
		['NEL (U+0085)', '\u0085'],
		['LS (U+2028)', '\u2028'],
		['VT (U+000B)', '\u000b'],
		['CR (U+000D)', '\r'],
		['ESC (U+001B)', '\u001b']
	])('a waiver reason with %s before "LAYER COUNT: 6" forges no line and keeps no control character', (_name, character) => {
		const notes = waived(`Board house confirmed${character}LAYER COUNT: 6`, 'standard quick-turn two-layer');
		expect(forged(notes)).toEqual([]);
		expect(notes).toContain('Reason: "Board house confirmed LAYER COUNT: 6"');
	});

	it('a fab-profile name with a line break forges no line: it is one quoted line', () => {
		const notes = waived('Board house confirmed by phone', 'Cheap house\nLAYER COUNT: 6\r\n');
		expect(forged(notes)).toEqual([]);
		expect(notes).toContain('against the "Cheap house LAYER COUNT: 6" profile accepted by the design team');
	});

	it('a quote in user text is escaped, so the quoted reason ends where it should', () => {
		const notes = waived('the "coarse" rule is fine', 'standard quick-turn two-layer');
		expect(notes).toContain('Reason: "the \\"coarse\\" rule is fine"');
	});

	it('a design name stored with a line break keeps the title on one line', () => {
		const notes = waived('Board house confirmed by phone', 'standard quick-turn two-layer', 'Sunroof\nLAYER COUNT: 6');
		expect(forged(notes)).toEqual([]);
		expect(unicodeLines(notes)[0]).toBe('FABRICATION NOTES — Sunroof LAYER COUNT: 6');
	});
});
