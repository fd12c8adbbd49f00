// STEP as an export format: asked for by name only, never in the default bundle (whose golden hash stays).
import { describe, expect, it } from 'vitest';
import { prepare, writeFiles } from '../../../../src/lib/design';
import { bundleFormatIds, formatEntry, parseFormatList } from '../../../../src/lib/formats';
import { parseDesignInput } from '../../../../src/lib/schemas';
import { goldenDesign, goldenMeta } from '../../../fixtures/bundle/golden-bundle';

describe('STEP export format', () => {
	it('is not in the default bundle, so the default bundle keeps its files and hash', () => {
		expect(bundleFormatIds as readonly string[]).not.toContain('step');
	});

	it('is parsed from --formats when named', () => {
		expect(parseFormatList('step')).toEqual(['step']);
		expect(parseFormatList('step,gerber')).toEqual(['gerber', 'step']);
	});

	it('is one registry entry with the IANA type model/step', () => {
		expect(formatEntry('step').contentType).toBe('model/step');
		expect(formatEntry('step').extension).toBe('step');
	});

	it('writes one board.step with the manifest naming it', async () => {
		const files = await writeFiles(prepare(parseDesignInput(goldenDesign)), parseFormatList('step'), goldenMeta);
		expect(files.map((f) => f.name)).toEqual(['sunroof-gnss-B.board.step', 'sunroof-gnss-B.manifest.json']);
		const text = new TextDecoder().decode(files[0].bytes);
		expect(text.startsWith('ISO-10303-21;\n')).toBe(true);
		expect(text).toContain("FILE_NAME('sunroof-gnss-B.board.step','2026-11-20T00:00:00'");
		expect(new TextDecoder().decode(files[1].bytes)).toContain('sunroof-gnss-B.board.step');
	});

	it('is written before the fab notes, which list it', async () => {
		const files = await writeFiles(prepare(parseDesignInput(goldenDesign)), parseFormatList('notes,step'), goldenMeta);
		expect(files.map((f) => f.name)).toEqual(['sunroof-gnss-B.board.step', 'sunroof-gnss-B.fab-notes.txt', 'sunroof-gnss-B.manifest.json']);
		expect(new TextDecoder().decode(files[1].bytes)).toContain('sunroof-gnss-B.board.step');
	});
});
