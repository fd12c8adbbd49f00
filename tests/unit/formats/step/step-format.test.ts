// STEP as an export format: asked for by name only, never in the default bundle (whose golden hash stays).
import { describe, expect, it } from 'vitest';
import { buildFilesFromInput, exportFormats, parseExportFormats } from '../../../../src/lib/formats/bundle';
import { goldenDesign, goldenMeta } from '../../../fixtures/bundle/golden-bundle';

describe('STEP export format', () => {
	it('is not in the default formats, so the default bundle keeps its files and hash', () => {
		expect(exportFormats as readonly string[]).not.toContain('step');
	});

	it('is parsed from --formats when named', () => {
		expect(parseExportFormats('step')).toEqual(['step']);
		expect(parseExportFormats('step,gerber')).toEqual(['gerber', 'step']);
	});

	it('writes one board.step with the manifest naming it', () => {
		const files = buildFilesFromInput(goldenDesign, goldenMeta, parseExportFormats('step'));
		expect(files.map((f) => f.name)).toEqual(['sunroof-gnss-B.board.step', 'sunroof-gnss-B.manifest.json']);
		const text = new TextDecoder().decode(files[0].bytes);
		expect(text.startsWith('ISO-10303-21;\n')).toBe(true);
		expect(text).toContain("FILE_NAME('sunroof-gnss-B.board.step','2026-11-20T00:00:00'");
		expect(new TextDecoder().decode(files[1].bytes)).toContain('sunroof-gnss-B.board.step');
	});
});
