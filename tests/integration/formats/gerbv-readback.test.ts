// Every Gerber and Excellon file we write, read back by a second, independent reader: gerbv (Debian package gerbv
// 2.9.6-1, installed by scripts/lib/gerbv.ts from `npm test`). Each file is loaded headless and written out again
// as RS-274X (`gerbv -x rs274x -o OUT FILE`, see `gerbv --help`): gerbv must print no parse complaint on stderr,
// and the coordinates it read must lie on our board (the profile's corners equal the board to 1 µm; drill hits
// equal ours to 1 µm). The first reader is @tracespace/parser (tests/unit/formats/gerber, drill).
//
// gerbv 2.9.6 does not implement the X2 attributes (%TF…%, %TA…%, %TO…%, %TD…%) and prints
// "Unknown RS-274X extension found %TF%" for each; the Gerber Layer Format Specification (Ucamco, rev. 2023.08,
// §5.1) says attributes never change the image and a reader may ignore them, so those lines alone are allowed.
// gerbv also guesses a file's type by looking for "%ADD" (gerber_is_rs274x_p in gerbv's src/gerber.c), so a copper
// layer drawn with regions alone (no aperture: allowed, spec §4.10) makes it print "Most likely found a RS-274D file"
// and "Missing apertures/drill sizes" before it parses the file as RS-274X all the same: those two lines are allowed
// for a file that defines no aperture only, and such a file must still give gerbv its region points.
// A mask file that opens nothing (a side with no opening: the header, G75 and M02, no graphics object) makes
// gerbv 2.9.6 abort ("free(): double free detected"): that is gerbv's bug, not a parse complaint, so such a file is
// checked to draw nothing and to be a mask, and is not handed to gerbv.
// Its exit status is 0 even for a file it could not parse (read from gerbv on broken files, below), so the test
// judges stderr, and the negative cases prove that each kind of damage is caught.
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { GERBV_INSTALL_HINT } from '../../../scripts/lib/gerbv';
import { prepare, writeFiles } from '../../../src/lib/design';
import { createExportMeta } from '../../../src/lib/formats/export-meta';
import { formatIds } from '../../../src/lib/formats/format-ids';
import { parseDesignInput, type DesignInputDocument } from '../../../src/lib/schemas';
import { designDocument } from '../../fixtures/designs/design-cases';
import { layeredCases } from '../../fixtures/designs/layered-cases';

const gerbv = process.env.FRINGEFIELD_GERBV || 'gerbv';
const layered = (name: string): DesignInputDocument => layeredCases.find((c) => c.name === name)!.doc;

/** Fixture designs that together emit every layer kind: copper top/inner/bottom, profile, masks, legend, both launches, NPTH and PTH drills. */
const designs: { slug: string; doc: DesignInputDocument; layers: RegExp[] }[] = [
	{
		// legend, solder masks, mounting holes (NPTH), the probe and a back launch with flange holes (PTH)
		slug: 'disc-finish-back',
		doc: designDocument('circular', 'probe', { name: 'Reader disc', solderMask: true, legend: { orderText: 'FR4 1.6MM ENIG' }, mountingHoles: [{ xMm: 3, yMm: 3, diameterMm: 3.2 }, { xMm: 42, yMm: 3, diameterMm: 2.2 }], launch: { kind: 'back', mount: 'flange' } }),
		layers: [/copper-top\.gbr$/, /copper-bottom\.gbr$/, /profile\.gbr$/, /mask-top\.gbr$/, /mask-bottom\.gbr$/, /legend-top\.gbr$/, /drill-plated\.drl$/, /drill-(non-plated|npth)[^/]*\.drl$/]
	},
	{ slug: 'rect-probe-back-pad', doc: designDocument('rectangular', 'probe', { name: 'Reader pad', launch: { kind: 'back' } }), layers: [/copper-bottom\.gbr$/, /drill-plated\.drl$/] },
	{ slug: 'rect-edge-launch', doc: designDocument('rectangular', 'edge', { name: 'Reader launch', solderMask: true, legend: {}, launch: { kind: 'edge', viaRows: 2 } }), layers: [/copper-top\.gbr$/, /legend-top\.gbr$/, /drill-plated\.drl$/] },
	{ slug: 'aperture-coupled', doc: { ...layered('aperture-coupled patch'), name: 'Reader aperture' }, layers: [/copper-inner-1\.gbr$/] },
	{ slug: 'array-2x2', doc: { ...layered('2×2 quarter-wave array'), name: 'Reader array' }, layers: [/copper-top\.gbr$/] },
	{ slug: 'corner-cut', doc: designDocument('truncated-corner', 'inset', { name: 'Reader corner-cut' }), layers: [/copper-top\.gbr$/] }
];

/**
 * gerbv's complaints: every non-empty stderr line but the X2-attribute notes the spec lets a reader ignore and, for
 * a Gerber file that defines no aperture, the two notes of gerbv's file-type guess (see the head of this file).
 */
function complaints(stderr: string, apertureless: boolean): string[] {
	return stderr
		.split('\n')
		.map((l) => l.trim())
		.filter((l) => l !== '' && !/Unknown RS-274X extension found %T[FAOD]% at line \d+/.test(l))
		.filter((l) => !(apertureless && (/Most likely found a RS-274D file .* trying to open anyways$/.test(l) || /Missing apertures\/drill sizes\.\.\.trying to load anyways$/.test(l))));
}

interface Readback {
	status: number | null;
	complaints: string[];
	/** Every X/Y point of the RS-274X gerbv wrote back, in mm (arc centre offsets I/J left out). */
	points: { x: number; y: number; flash: boolean }[];
}

let dir = '';

/** Reads one file with gerbv and parses the RS-274X it writes back (%MOIN%, %FSLAX36Y36%: 1e-6 inch units). */
function readBack(name: string, bytes: Uint8Array): Readback {
	const input = join(dir, name);
	const output = `${input}.gerbv.gbr`;
	writeFileSync(input, bytes);
	const r = spawnSync(gerbv, ['-x', 'rs274x', '-o', output, input], { encoding: 'utf8', timeout: 20_000, env: { ...process.env, DISPLAY: '' } });
	if (r.error) throw new Error(`gerbv did not start (${r.error.message}): ${GERBV_INSTALL_HINT}`);
	let text = '';
	try {
		text = readFileSync(output, 'utf8');
	} catch {
		// no output: the status and complaints say why
	}
	expect(text === '' || /%MOIN\*%[\s\S]*%FSLAX36Y36\*%/.test(text), `${name}: gerbv's export keeps inch, 3.6 format`).toBe(true);
	const points: Readback['points'] = [];
	let x = 0;
	let y = 0;
	for (const line of text.split('\n')) {
		if (line.startsWith('G04') || line.startsWith('%')) continue;
		const mx = /X(-?\d+)/.exec(line);
		const my = /Y(-?\d+)/.exec(line);
		if (!mx && !my) continue;
		if (mx) x = (Number(mx[1]) / 1e6) * 25.4;
		if (my) y = (Number(my[1]) / 1e6) * 25.4;
		points.push({ x, y, flash: /D0?3\*/.test(line) });
	}
	const source = new TextDecoder().decode(bytes);
	const apertureless = name.endsWith('.gbr') && !source.includes('%ADD') && /^G36\*$/m.test(source);
	return { status: r.status, complaints: complaints(r.stderr, apertureless), points };
}

/** Drill hits of our Excellon file (METRIC, decimal point), in mm. */
function drillHits(text: string): { x: number; y: number }[] {
	return [...text.matchAll(/^X(-?[\d.]+)Y(-?[\d.]+)$/gm)].map((m) => ({ x: Number(m[1]), y: Number(m[2]) }));
}

const UM = 1e-3;

beforeAll(() => {
	const v = spawnSync(gerbv, ['--version'], { encoding: 'utf8', timeout: 15_000 });
	if (v.error || v.status !== 0) throw new Error(`gerbv is missing: ${GERBV_INSTALL_HINT}`);
	dir = mkdtempSync(join(tmpdir(), 'ff-gerbv-'));
});
afterAll(() => {
	if (dir) rmSync(dir, { recursive: true, force: true });
});

/**
 * What is wrong with one of our Gerber or drill files as gerbv reads it, [] when nothing: an exit status other than 0,
 * a complaint on stderr, no coordinates read, a point off the board by more than 1 µm, a profile whose extents
 * differ from the board by more than 1 µm, a drill hit gerbv did not read where our file puts it (to 1 µm).
 */
function problemsOf(name: string, bytes: Uint8Array, board: { widthMm: number; lengthMm: number }): string[] {
	const { widthMm: w, lengthMm: l } = board;
	const problems: string[] = [];
	const back = readBack(name, bytes);
	if (back.status !== 0) problems.push(`exit status ${back.status}`);
	problems.push(...back.complaints);
	if (back.points.length === 0) problems.push('no coordinates read');
	// every point gerbv read lies on the board (copper may touch the edge)
	for (const p of back.points) {
		if (p.x < -UM || p.x > w + UM || p.y < -UM || p.y > l + UM) problems.push(`point off the board: ${p.x.toFixed(4)}, ${p.y.toFixed(4)} mm`);
	}
	if (name.endsWith('profile.gbr') && back.points.length > 0) {
		// the outline's extents, as gerbv read them, are the board's: 0…width × 0…length
		const xs = back.points.map((p) => p.x);
		const ys = back.points.map((p) => p.y);
		const extents = [Math.min(...xs), Math.min(...ys), Math.max(...xs), Math.max(...ys)];
		const board4 = [0, 0, w, l];
		if (extents.some((v, i) => Math.abs(v - board4[i]) > UM)) problems.push(`profile extents ${extents.map((v) => v.toFixed(4)).join(' ')} are not the board's ${board4.join(' ')}`);
	}
	if (name.endsWith('.drl')) {
		// gerbv flashes one hit per hole of ours, at our coordinates (our file: 1 µm resolution)
		const ours = drillHits(new TextDecoder().decode(bytes));
		const theirs = back.points.filter((p) => p.flash);
		if (ours.length === 0) problems.push('no hit in our drill file');
		if (theirs.length !== ours.length) problems.push(`gerbv read ${theirs.length} hits, our file has ${ours.length}`);
		for (const hit of ours) {
			if (!theirs.some((p) => Math.abs(p.x - hit.x) <= UM && Math.abs(p.y - hit.y) <= UM)) problems.push(`hit ${hit.x}, ${hit.y} not read there`);
		}
	}
	return problems;
}

describe.each(designs)('gerbv reads back every Gerber and drill file of $slug', ({ slug, doc, layers }) => {
	it('without complaint, on the board, drill hits where we put them', async () => {
		const prepared = prepare(parseDesignInput(doc));
		const meta = createExportMeta({ designName: doc.name ?? slug, revisionLabel: 'A', revisionDate: '2026-12-01' });
		const files = (await writeFiles(prepared, formatIds, meta)).filter((f) => /\.(gbr|drl)$/.test(f.name));
		// the layer kinds this design is here for are among the files
		for (const layer of layers) expect(files.map((f) => f.name).some((n) => layer.test(n)), `${slug} writes ${layer}`).toBe(true);
		let read = 0;
		for (const f of files) {
			const text = new TextDecoder().decode(f.bytes);
			if (f.name.endsWith('.gbr') && !/D0?[123]\*/.test(text) && !/^G36\*$/m.test(text)) {
				// no graphics object at all (see the head of this file): only a mask side without openings may be so
				expect(f.name, `${f.name} draws nothing`).toMatch(/mask-(top|bottom)\.gbr$/);
				expect(text).toMatch(/%TF\.FilePolarity,Negative\*%[\s\S]*M02\*\s*$/);
				continue;
			}
			expect(problemsOf(`${slug}-${f.name}`, f.bytes, prepared.artwork.board), f.name).toEqual([]);
			read++;
		}
		expect(read).toBeGreaterThanOrEqual(layers.length);
	});
});

describe('the check fails on files gerbv cannot read cleanly or reads off the board (messages read from gerbv 2.9.6 itself)', () => {
	async function goodFiles() {
		const doc = designDocument('circular', 'probe', { name: 'Reader broken', launch: { kind: 'back' } });
		const meta = createExportMeta({ designName: 'Reader broken', revisionLabel: 'A', revisionDate: '2026-12-01' });
		const prepared = prepare(parseDesignInput(doc));
		const files = await writeFiles(prepared, formatIds, meta);
		const text = (re: RegExp) => new TextDecoder().decode(files.find((f) => re.test(f.name))!.bytes);
		return { board: prepared.artwork.board, gerber: text(/copper-top\.gbr$/), drill: text(/drill-plated\.drl$/), profile: text(/profile\.gbr$/) };
	}
	const enc = (s: string) => new TextEncoder().encode(s);

	it('passes the unbroken files (so the failures below are the damage)', async () => {
		const { board, gerber, drill, profile } = await goodFiles();
		expect(gerber).toMatch(/%ADD10/);
		expect(problemsOf('ok.copper-top.gbr', enc(gerber), board)).toEqual([]);
		expect(problemsOf('ok.profile.gbr', enc(profile), board)).toEqual([]);
		expect(problemsOf('ok.drill-plated.drl', enc(drill), board)).toEqual([]);
	});

	it.each([
		// "Found undefined D code D99"
		['an undefined aperture', (g: string) => g.replace(/^D10\*$/m, 'D99*'), /undefined D code/i],
		// "Found unknown character 'Q'"
		['a stray letter in a coordinate', (g: string) => g.replace(/^X(\d)/m, 'XQ$1'), /unknown character/i],
		// "Unknown file type" / "Could not read" (and gerbv dies of a signal: no exit status)
		['a truncated file', (g: string) => g.slice(0, 120), /unknown file type|could not read/i],
		// "Missing format in file...trying to load anyways"
		['no format statement', (g: string) => g.replace(/^%FSLAX46Y46\*%$/m, ''), /missing format/i],
		// gerbv's file-type notes are allowed for a file without apertures only: this one flashes D10 and loses its %ADD
		['its aperture definition removed', (g: string) => g.replace(/^%ADD10C,[\d.]+\*%$/m, ''), /RS-274D|Missing apertures|undefined D code/i]
	])('a Gerber with %s', async (what, damage, message) => {
		const { board, gerber } = await goodFiles();
		const broken = damage(gerber);
		expect(broken).not.toBe(gerber);
		const problems = problemsOf(`broken-${what.replace(/\W+/g, '-')}.copper-top.gbr`, enc(broken), board);
		expect(problems.join('\n')).toMatch(message);
	});

	it('a profile 10 µm wider than the board', async () => {
		const { board, profile } = await goodFiles();
		const wide = Math.round((board.widthMm + 0.01) * 1e6);
		const broken = profile.replace(new RegExp(`X${Math.round(board.widthMm * 1e6)}Y`, 'g'), `X${wide}Y`);
		expect(broken).not.toBe(profile);
		const problems = problemsOf('broken-wide.profile.gbr', enc(broken), board);
		expect(problems.join('\n')).toMatch(/profile extents .* are not the board's/);
		expect(problems.join('\n')).toMatch(/point off the board/);
	});

	it.each([
		// "Tool 07 used without being defined"
		['an undefined tool', (d: string) => d.replace(/^T01$/m, 'T07'), /used without being defined/i],
		// "Ignoring undefined character 'Q' found inside data"
		['a stray letter in a hit', (d: string) => d.replace(/^X(\d+)\./m, 'X$1Q.'), /undefined character/i],
		// a hit 1 mm left of the board: read cleanly, but off the board
		['a hit off the board', (d: string) => d.replace(/^X[\d.]+Y/m, 'X-1.000Y'), /point off the board/]
	])('a drill file with %s', async (what, damage, message) => {
		const { board, drill } = await goodFiles();
		const broken = damage(drill);
		expect(broken).not.toBe(drill);
		const problems = problemsOf(`broken-${what.replace(/\W+/g, '-')}.drill-plated.drl`, enc(broken), board);
		expect(problems.join('\n')).toMatch(message);
	});
});
