// STEP files read back by an independent reader: occt-import-js 0.0.23 (Open CASCADE's STEP translator as WebAssembly).
import { readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { buildArtwork, type Artwork, type ArtworkShape } from '../../../../src/lib/artwork';
import { contourBounds, createCircleContour, createPolygonContour, differenceRegions, flattenContour, mergeBounds, emptyBounds, regionArea, unionRegions, type Bounds, type Region } from '../../../../src/lib/geometry';
import { createExportMeta, type ExportMeta } from '../../../../src/lib/formats/export-meta';
import { buildStepBodies, toStep } from '../../../../src/lib/formats/step';
import type { DesignInputDocument } from '../../../../src/lib/schemas';
import { readStep, type ReadBody } from './read-step';
import { sizeDocument } from '../../../fixtures/designs/size-document';

const FIXTURES = join(__dirname, '../../../fixtures/step');
/** Set FRINGEFIELD_WRITE_GOLDEN=1 to rewrite the expected files after an intended change (and say so in the commit). */
const WRITE_GOLDEN = process.env.FRINGEFIELD_WRITE_GOLDEN === '1';

interface Case {
	name: string;
	artwork: Artwork;
	meta: ExportMeta;
	fileName: string;
	text: string;
}

function loadCase(name: string): Case {
	const input = JSON.parse(readFileSync(join(FIXTURES, name, 'input.json'), 'utf8')) as { meta: { designName: string; revisionLabel: string; revisionDate: string }; design: DesignInputDocument };
	const meta = createExportMeta(input.meta);
	const artwork = buildArtwork(sizeDocument(input.design));
	const fileName = `${meta.designSlug}-${meta.revisionLabel}.board.step`;
	return { name, artwork, meta, fileName, text: toStep(artwork, meta, fileName) };
}

const cases = readdirSync(FIXTURES).filter((d) => !d.startsWith('broken-')).sort().map(loadCase);

/** The names each fixture's bodies must carry, top to bottom (our naming: "L<copper> <layer title>", "core n (εr …)"). */
const expectedNames: Record<string, string[]> = {
	'inset-patch': ['L1 Top copper (patch and feed)', 'substrate (εr 3.55)', 'L2 Bottom copper (ground)'],
	'probe-patch': ['L1 Top copper (patch and feed)', 'substrate (εr 3.38)', 'L2 Bottom copper (ground)', 'probe-drill barrel (plated, 25 µm wall)'],
	'aperture-coupled-stack': ['L1 Top copper (patch)', 'core 1 (εr 2.2)', 'bonding film 1 (εr 3)', 'L2 Inner copper (layer 2) (ground)', 'core 2 (εr 3.55)', 'L3 Bottom copper (feed)']
};

/** 1 µm: the task's extents tolerance; the writer's chords stay within 0.5 µm of every arc. */
const EXTENT_TOLERANCE_MM = 0.001;
/** 0.5 %: the task's volume tolerance (area × thickness against the mesh's enclosed volume). */
const VOLUME_TOLERANCE = 0.005;

// The test's own expectation of a copper layer's area, drawn at 0.1 µm chords (five times finer than the writer's).
const fine = (c: Region['outer']) => createPolygonContour(flattenContour(c, 0.0001));
const shapeArea = (s: ArtworkShape): Region[] =>
	s.geometry.kind === 'circle'
		? [{ outer: fine(createCircleContour(s.geometry.center, s.geometry.diameterMm / 2)), holes: [] }]
		: s.geometry.kind === 'region'
			? [{ outer: fine(s.geometry.region.outer), holes: s.geometry.region.holes.map(fine) }]
			: [];
const shapeBounds = (s: ArtworkShape): Bounds =>
	s.geometry.kind === 'circle'
		? contourBounds(createCircleContour(s.geometry.center, s.geometry.diameterMm / 2))
		: s.geometry.kind === 'region'
			? contourBounds(s.geometry.region.outer)
			: emptyBounds;

/** What the fab drills: the finished hole, plus the barrel wall twice for a plated barrel (ArtworkProbe's doc comment). */
function drilledMm(artwork: Artwork): number[] {
	const p = artwork.metadata.probe;
	return artwork.drills.map((d) => d.diameterMm + (p?.model === 'plated-barrel' ? (2 * (p.platingThicknessUm ?? 0)) / 1000 : 0));
}

interface Expected {
	prefix: string;
	min: [number, number, number];
	max: [number, number, number];
	volumeMm3: number;
}

/** Each stack slab's extents and volume, worked out from the artwork without the writer. */
function expectedSlabs(artwork: Artwork): Expected[] {
	const drilled = drilledMm(artwork);
	const holes = artwork.drills.map((d, i) => ({ outer: fine(createCircleContour(d.center, drilled[i] / 2)), holes: [] }));
	let copper = 0, core = 0, bonding = 0;
	return artwork.stack.map((slab) => {
		const z: [number, number] = [slab.zMm, slab.zMm + slab.thicknessMm];
		if (slab.kind === 'dielectric') {
			const area = artwork.board.widthMm * artwork.board.lengthMm - drilled.reduce((s, d) => s + (Math.PI * d * d) / 4, 0);
			const prefix = slab.bonding ? `bonding film ${++bonding}` : slab.id === 'substrate' ? 'substrate' : `core ${++core}`;
			return { prefix, min: [0, 0, z[0]], max: [artwork.board.widthMm, artwork.board.lengthMm, z[1]], volumeMm3: area * slab.thicknessMm };
		}
		copper++;
		const layer = artwork.layers.find((l) => l.id === slab.layerId)!;
		let regions: Region[] = [];
		let b = emptyBounds;
		for (const s of layer.shapes) {
			if (s.polarity === 'dark') b = mergeBounds(b, shapeBounds(s));
			const r = shapeArea(s);
			if (r.length) regions = s.polarity === 'dark' ? unionRegions(regions, r) : differenceRegions(regions, r);
		}
		if (holes.length) regions = differenceRegions(regions, holes);
		const area = regions.reduce((s, r) => s + regionArea(r), 0);
		return { prefix: `L${copper} `, min: [b.minXMm, b.minYMm, z[0]], max: [b.maxXMm, b.maxYMm, z[1]], volumeMm3: area * slab.thicknessMm };
	});
}

function merged(bodies: ReadBody[]): Omit<Expected, 'prefix'> {
	return bodies.reduce(
		(acc, b) => ({ min: acc.min.map((v, k) => Math.min(v, b.min[k])) as Expected['min'], max: acc.max.map((v, k) => Math.max(v, b.max[k])) as Expected['max'], volumeMm3: acc.volumeMm3 + Math.abs(b.volumeMm3) }),
		{ min: [Infinity, Infinity, Infinity], max: [-Infinity, -Infinity, -Infinity], volumeMm3: 0 } as Omit<Expected, 'prefix'>
	);
}

describe('STEP writer read back by Open CASCADE (occt-import-js 0.0.23)', () => {
	it('has the three fixture designs', () => {
		expect(cases.map((c) => c.name)).toEqual(['aperture-coupled-stack', 'inset-patch', 'probe-patch']);
	});

	describe.each(cases)('$name', (c) => {
		it('matches its golden file byte for byte', () => {
			const golden = join(FIXTURES, c.name, 'expected.step');
			if (WRITE_GOLDEN) writeFileSync(golden, c.text);
			expect(c.text).toBe(readFileSync(golden, 'utf8'));
		});

		it('reads as one assembly of named bodies, in stack order, each with its material colour', async () => {
			const read = await readStep(c.text);
			expect(read.success).toBe(true);
			expect(read.assemblyName).toBe(`${c.meta.designName} revision ${c.meta.revisionLabel}`);
			expect(read.bodies.map((b) => b.name)).toEqual(expectedNames[c.name]);
			// STYLED_ITEM colours (ISO 10303-214 presentation entities) reach the reader: copper bodies share one colour, unlike the laminate's
			const colourOf = (name: string) => JSON.stringify(read.bodies.find((b) => b.name === name)!.colour);
			const coppers = read.bodies.filter((b) => b.name.startsWith('L'));
			expect(coppers[0].colour).toBeDefined();
			expect(new Set(coppers.map((b) => colourOf(b.name))).size).toBe(1);
			expect(colourOf(read.bodies.find((b) => /^(core|substrate)/.test(b.name))!.name)).not.toBe(colourOf(coppers[0].name));
		});

		it('gives every slab the stack extents within 1 µm and area × thickness within 0.5 %', async () => {
			const read = await readStep(c.text);
			for (const e of expectedSlabs(c.artwork)) {
				const got = merged(read.bodies.filter((b) => b.name.startsWith(e.prefix)));
				for (let k = 0; k < 3; k++) {
					expect(Math.abs(got.min[k] - e.min[k]), `${e.prefix} min[${k}]`).toBeLessThan(EXTENT_TOLERANCE_MM);
					expect(Math.abs(got.max[k] - e.max[k]), `${e.prefix} max[${k}]`).toBeLessThan(EXTENT_TOLERANCE_MM);
				}
				expect(Math.abs(got.volumeMm3 / e.volumeMm3 - 1), `${e.prefix} volume ${got.volumeMm3} vs ${e.volumeMm3}`).toBeLessThan(VOLUME_TOLERANCE);
			}
		});

		it('reads back every planar face the writer built (bottom, top and one side per edge)', async () => {
			const read = await readStep(c.text);
			const bodies = buildStepBodies(c.artwork);
			expect(read.bodies.map((b) => b.faceCount)).toEqual(bodies.map((b) => 2 + b.face.outer.length + b.face.holes.reduce((s, h) => s + h.length, 0)));
		});

		it('writes the same bytes twice (dates from the revision, fixed order and digits)', () => {
			expect(toStep(c.artwork, c.meta, c.fileName)).toBe(c.text);
			expect(c.text).toContain(`'${c.meta.revisionDate}T00:00:00'`);
		});
	});

	it('cuts the probe hole through substrate and coppers and fills it with the barrel wall', async () => {
		const c = cases.find((k) => k.name === 'probe-patch')!;
		const d = c.artwork.drills[0];
		const read = await readStep(c.text);
		const barrel = read.bodies.find((b) => b.name.includes('barrel'))!;
		const outerMm = d.diameterMm + 0.05; // 25 µm wall on each side (the fixture's stated plating)
		const top = c.artwork.stack[0];
		const bottom = c.artwork.stack[c.artwork.stack.length - 1];
		const heightMm = top.zMm + top.thicknessMm - bottom.zMm;
		// a tube: π/4 (D² − d²) h
		expect(Math.abs(barrel.volumeMm3 / ((Math.PI / 4) * (outerMm ** 2 - d.diameterMm ** 2) * heightMm) - 1)).toBeLessThan(VOLUME_TOLERANCE);
		expect(Math.abs(barrel.min[0] - (d.center[0] - outerMm / 2))).toBeLessThan(EXTENT_TOLERANCE_MM);
		expect(Math.abs(barrel.max[2] - heightMm)).toBeLessThan(EXTENT_TOLERANCE_MM);
	});

	it('models a solid probe pin as a cylinder filling the finished hole', async () => {
		const design = JSON.parse(readFileSync(join(FIXTURES, 'probe-patch', 'input.json'), 'utf8')).design as DesignInputDocument;
		const artwork = buildArtwork(sizeDocument({ ...design, probe: { model: 'solid-pin' } }));
		const meta = createExportMeta({ designName: 'Pin check', revisionLabel: 'A', revisionDate: '2026-11-20' });
		const read = await readStep(toStep(artwork, meta, 'pin-check-A.board.step'));
		const pin = read.bodies.find((b) => b.name.includes('pin'))!;
		const d = artwork.drills[0];
		const heightMm = artwork.stack[0].zMm + artwork.stack[0].thicknessMm;
		expect(pin.name).toBe(`probe-drill pin (solid, Ø ${d.diameterMm.toFixed(3)} mm)`);
		expect(Math.abs(pin.volumeMm3 / ((Math.PI / 4) * d.diameterMm ** 2 * heightMm) - 1)).toBeLessThan(VOLUME_TOLERANCE);
	});
});
