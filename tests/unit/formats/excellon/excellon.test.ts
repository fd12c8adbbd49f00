// Excellon drill files read back with @tracespace/parser 5.0.0-next.0 (the outside reference).
import { createParser } from '@tracespace/parser';
import { describe, expect, it } from 'vitest';
import { buildArtwork, type Artwork } from '../../../../src/lib/artwork';
import { createExportMeta } from '../../../../src/lib/formats/export-meta';
import { buildExcellonCommands, toExcellon } from '../../../../src/lib/formats/excellon';
import { sizedCase } from '../../../fixtures/designs/design-cases';

const meta = createExportMeta({ designName: 'Sunroof GNSS', revisionLabel: 'B', revisionDate: '2026-11-20' });
const parse = (text: string) => {
	const p = createParser();
	p.feed(text);
	return p.results();
};

const probe = buildArtwork(sizedCase('rectangular', 'probe'));
/** A hand-made artwork with non-plated holes of two sizes (mounting holes), for the NPTH file. */
const withMounting: Artwork = {
	...probe,
	drills: [
		...probe.drills,
		{ id: 'mount-1', role: 'probe', plated: false, center: [3.2, 3.2], diameterMm: 3.2, fromCopper: 1, toCopper: 2 },
		{ id: 'mount-2', role: 'probe', plated: false, center: [12.5, 3.2], diameterMm: 2.5, fromCopper: 1, toCopper: 2 }
	]
};

describe('Excellon writer', () => {
	it.each([
		// plated probe hole of a probe-fed rectangular patch
		{ name: 'plated', artwork: withMounting, plated: true, fn: '#@! TF.FileFunction,Plated,1,2,PTH' },
		// two non-plated holes of different diameters
		{ name: 'non-plated', artwork: withMounting, plated: false, fn: '#@! TF.FileFunction,NonPlated,1,2,NPTH' }
	])('writes a $name file that parses completely and reads back every hole within 1 µm', ({ artwork, plated, fn }) => {
		const tree = parse(toExcellon(artwork, plated, meta));
		expect(tree.filetype).toBe('drill');
		expect(tree.done).toBe(true);
		const comments = tree.children.flatMap((n) => (n.type === 'comment' ? [n.comment] : []));
		expect(comments).toContain(fn);
		const units = tree.children.find((n) => n.type === 'units');
		expect(units && units.type === 'units' && units.units).toBe('mm');
		const tools = new Map<string, number>();
		let tool = '';
		const hits: { x: number; y: number; d: number }[] = [];
		for (const n of tree.children) {
			if (n.type === 'toolDefinition' && n.shape.type === 'circle') tools.set(n.code, n.shape.diameter);
			if (n.type === 'toolChange') tool = n.code;
			if (n.type === 'graphic') hits.push({ x: Number(n.coordinates.x), y: Number(n.coordinates.y), d: tools.get(tool)! });
		}
		const expected = artwork.drills.filter((d) => d.plated === plated);
		expect(hits.length).toBe(expected.length);
		for (const d of expected) {
			const hit = hits.find((h) => Math.abs(h.x - d.center[0]) < 1e-3 && Math.abs(h.y - d.center[1]) < 1e-3);
			expect(hit).toBeDefined();
			expect(Math.abs(hit!.d - d.diameterMm)).toBeLessThan(1e-3);
		}
	});

	it('numbers tools by ascending diameter and keeps plated and non-plated holes apart', () => {
		const npth = buildExcellonCommands(withMounting, false, meta).filter((c) => c.type === 'define-tool');
		expect(npth.map((c) => (c.type === 'define-tool' ? c.diameterMm : 0))).toEqual([2.5, 3.2]);
		const pth = buildExcellonCommands(withMounting, true, meta).filter((c) => c.type === 'hit');
		expect(pth.length).toBe(1);
	});

	it('starts with M48, ends the header with M95 and the file with M30', () => {
		const lines = toExcellon(probe, true, meta).trimEnd().split('\n');
		expect(lines[0]).toBe('M48');
		expect(lines).toContain('M95');
		expect(lines.at(-1)).toBe('M30');
		expect(lines).toContain('METRIC,TZ,000.000');
	});
});
