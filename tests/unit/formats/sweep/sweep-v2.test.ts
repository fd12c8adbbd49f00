// Sweep document version 2: the checked-in fixtures are what the code writes, validate (ajv 8, draft 2020-12, the outside
// reference) against the generated v2 schema, and state every field a solver needs; v1 documents still validate against
// the v1 schema; hold-geometry and resize sweeps differ as they say.
import { readFileSync } from 'node:fs';
import Ajv2020 from 'ajv/dist/2020';
import { describe, expect, it } from 'vitest';
import { applicableInput, buildSweepDocument, sweepJsonSchema, sweepJsonSchemaV1, type SweepDocument } from '../../../../src/lib/formats/sweep';
import { InputError, parseDesignInput } from '../../../../src/lib/schemas';
import { designDocument } from '../../../fixtures/designs/design-cases';
import { sweepFixtureCases, sweepFixtureMeta, sweepFixtureText } from '../../../fixtures/sweep/sweep-cases';

const fixtureUrl = (file: string) => new URL(`../../../fixtures/sweep/${file}`, import.meta.url);
const ajv = () => new Ajv2020({ allErrors: true, strict: true, strictTypes: false, strictTuples: false });
const validateV2 = ajv().compile(sweepJsonSchema as object);
const validateV1 = ajv().compile(sweepJsonSchemaV1 as object);

type Json = Record<string, unknown>;
/** The value at a dotted path ("a.b.0.c"), or undefined. */
function at(doc: unknown, path: string): unknown {
	return path.split('.').reduce<unknown>((node, key) => (node !== null && typeof node === 'object' ? (node as Json)[key] : undefined), doc);
}

/**
 * What a solver needs to set up a point without guessing, as paths in a sized point (what a full-wave set-up asks for:
 * ports with their reference, the band, the frequency the material data hold at, conductors, the dielectric's extent;
 * common practice, no source).
 */
const solverNeedsEveryPort = [
	'solverSetup.ports.0.kind',
	'solverSetup.ports.0.location.0',
	'solverSetup.ports.0.location.1',
	'solverSetup.ports.0.referenceImpedanceOhm',
	'solverSetup.ports.0.signalCopper',
	'solverSetup.ports.0.returnCopper',
	'solverSetup.frequencyWindow.startHz',
	'solverSetup.frequencyWindow.stopHz',
	'solverSetup.materialsHoldAtHz',
	'solverSetup.dielectricOutline.origin',
	'solverSetup.dielectricOutline.contour.2'
];
const solverNeedsEdgeLine = ['solverSetup.ports.0.edge', 'solverSetup.ports.0.lineWidthMm'];
const solverNeedsProbe = ['solverSetup.ports.0.model', 'solverSetup.ports.0.pinDiameterMm', 'solverSetup.ports.0.antiPadDiameterMm', 'solverSetup.ports.0.padDiameterMm', 'solverSetup.ports.0.platingThicknessUm'];
/** Per copper of the stack: where it is, how thick, how well it conducts; per dielectric: εr, tanδ, thickness. */
const copperNeeds = ['zMm', 'thicknessMm', 'conductivitySPerM'];
const dielectricNeeds = ['zMm', 'thicknessMm', 'relativePermittivity', 'lossTangent'];

describe('sweep JSON version 2 fixtures', () => {
	it.each(sweepFixtureCases.map((c) => [c.file, c] as const))('%s is what the code writes today', (file, c) => {
		expect(readFileSync(fixtureUrl(file), 'utf8')).toBe(sweepFixtureText(c));
	});

	it.each(sweepFixtureCases.map((c) => [c.file] as const))('%s validates against the generated v2 schema', (file) => {
		const doc = JSON.parse(readFileSync(fixtureUrl(file), 'utf8'));
		const ok = validateV2(doc);
		expect(validateV2.errors ?? []).toEqual([]);
		expect(ok).toBe(true);
		expect(doc).toMatchObject({ $schema: '/schemas/sweep-v2.json', formatVersion: 2 });
	});

	it.each(sweepFixtureCases.map((c) => [c.file] as const))('%s states every field a solver needs at every sized point', (file) => {
		const doc = JSON.parse(readFileSync(fixtureUrl(file), 'utf8')) as SweepDocument;
		const probeFed = doc.base.feed === 'probe';
		for (const point of doc.points) {
			expect(point.status).toBe('sized');
			const needs = [...solverNeedsEveryPort, ...(probeFed ? solverNeedsProbe : solverNeedsEdgeLine)];
			for (const path of needs) expect(at(point, path), `${file} point ${point.index}: ${path}`).not.toBeUndefined();
			if (point.status !== 'sized') continue;
			const port = point.solverSetup.ports[0];
			const copperIds = point.stack.filter((l) => l.kind === 'copper').map((l) => l.id);
			// the signal and return coppers are coppers of the stack, and not the same one
			expect(copperIds).toContain(port.signalCopper);
			expect(copperIds).toContain(port.returnCopper);
			expect(port.signalCopper).not.toBe(port.returnCopper);
			// the port lies on the board (for a line: on its edge)
			expect(port.location[0]).toBeGreaterThanOrEqual(0);
			expect(port.location[0]).toBeLessThanOrEqual(point.board.widthMm);
			expect(port.location[1]).toBeGreaterThanOrEqual(0);
			expect(port.location[1]).toBeLessThanOrEqual(point.board.lengthMm);
			// the window holds the design frequency; the materials hold at a frequency inside it
			const { startHz, stopHz } = point.solverSetup.frequencyWindow;
			expect(startHz).toBeLessThan(point.derived.frequencyHz);
			expect(stopHz).toBeGreaterThan(point.derived.frequencyHz);
			expect(point.solverSetup.materialsHoldAtHz).toBeGreaterThanOrEqual(startHz);
			expect(point.solverSetup.materialsHoldAtHz).toBeLessThanOrEqual(stopHz);
			// the dielectric outline is the board's, from its lower-left corner
			expect(point.solverSetup.dielectricOutline.contour).toEqual([[0, 0], [point.board.widthMm, 0], [point.board.widthMm, point.board.lengthMm], [0, point.board.lengthMm]]);
			for (const layer of point.stack) {
				const needsHere = layer.kind === 'copper' ? copperNeeds : layer.kind === 'dielectric' ? dielectricNeeds : [];
				for (const key of needsHere) expect(typeof (layer as unknown as Json)[key], `${file} ${layer.id}.${key}`).toBe('number');
			}
		}
	});

	it('the aperture-coupled fixture feeds from the bottom copper against the inner ground, across three coppers', () => {
		const doc = JSON.parse(readFileSync(fixtureUrl('v2-aperture.json'), 'utf8')) as SweepDocument;
		const point = doc.points[0];
		if (point.status !== 'sized') throw new Error('expected a sized point');
		expect(point.solverSetup.ports).toEqual([expect.objectContaining({ kind: 'edge-line', edge: 'bottom', signalCopper: 'copper-bottom', returnCopper: 'copper-inner-1' })]);
		expect(point.stack.filter((l) => l.kind === 'copper')).toHaveLength(3);
	});

	it('the probe fixture states the plated barrel it was given, with pin and anti-pad diameters', () => {
		const doc = JSON.parse(readFileSync(fixtureUrl('v2-probe.json'), 'utf8')) as SweepDocument;
		const point = doc.points[0];
		if (point.status !== 'sized') throw new Error('expected a sized point');
		expect(point.solverSetup.ports[0]).toMatchObject({ kind: 'coaxial-probe', model: 'plated-barrel', modelStated: true, pinDiameterMm: 1.3, platingThicknessUm: 25, antiPadDiameterMm: 4.1, signalCopper: 'copper-top', returnCopper: 'copper-bottom' });
	});

	it('a probe without a stated model is written as a solid pin and says it was not stated', () => {
		const doc = buildSweepDocument(designDocument('rectangular', 'probe'), { axes: [{ field: 'frequencyHz', values: [2.45e9] }] }, sweepFixtureMeta);
		const point = doc.points[0];
		if (point.status !== 'sized') throw new Error('expected a sized point');
		expect(point.solverSetup.ports[0]).toMatchObject({ model: 'solid-pin', modelStated: false, platingThicknessUm: null });
	});
});

describe('the base of a version-2 document', () => {
	it.each([
		// [fixture, fields that must be absent, fields that must be present]
		['v2-inset.json', ['handedness', 'probe', 'slot', 'proximity'], ['inset', 'feedLineImpedanceOhm']],
		['v2-probe.json', ['handedness', 'inset', 'feedLineImpedanceOhm', 'slot'], ['probe']],
		['v2-aperture.json', ['handedness', 'probe', 'inset', 'proximity'], ['stack', 'feedLineImpedanceOhm']]
	] as const)('%s carries only what applies to the design', (file, absent, present) => {
		const doc = JSON.parse(readFileSync(fixtureUrl(file), 'utf8'));
		for (const key of absent) expect(doc.base, `${file}: base.${key}`).not.toHaveProperty(key);
		for (const key of present) expect(doc.base, `${file}: base.${key}`).toHaveProperty(key);
	});

	it('keeps the handedness of a circularly polarised patch', () => {
		expect(applicableInput(parseDesignInput(designDocument('truncated-corner', 'probe')))).toHaveProperty('handedness', 'rhcp');
	});

	it('sizes to the same design as the full input', () => {
		for (const c of sweepFixtureCases) {
			const full = parseDesignInput(c.base);
			expect(parseDesignInput(applicableInput(full))).toEqual(full);
		}
	});
});

describe('the version-1 schema', () => {
	it('still validates a version-1 document written before version 2', () => {
		const doc = JSON.parse(readFileSync(fixtureUrl('v1-inset.json'), 'utf8'));
		expect(doc.formatVersion).toBe(1);
		const ok = validateV1(doc);
		expect(validateV1.errors ?? []).toEqual([]);
		expect(ok).toBe(true);
	});

	it('refuses a version-2 document, and the version-2 schema refuses a version-1 one', () => {
		expect(validateV1(JSON.parse(readFileSync(fixtureUrl('v2-inset.json'), 'utf8')))).toBe(false);
		expect(validateV2(JSON.parse(readFileSync(fixtureUrl('v1-inset.json'), 'utf8')))).toBe(false);
	});
});

describe('sweep modes', () => {
	const base = designDocument('rectangular', 'inset');
	const permittivity = { field: 'substrate.relativePermittivity', values: [3.3, 3.55, 3.8] };
	const sized = (doc: SweepDocument) => doc.points.map((p) => (p.status === 'sized' ? p : (() => { throw new Error(`point ${p.index} refused: ${p.error.message}`); })()));
	const patch = (p: ReturnType<typeof sized>[number]) => p.derived.patch as unknown as { lengthMm: number; widthMm: number };

	it('a hold-geometry εr sweep keeps the patch length, width, inset depth and board of the revision at every point', () => {
		const points = sized(buildSweepDocument(base, { mode: 'hold-geometry', axes: [permittivity] }, sweepFixtureMeta));
		const revision = buildSweepDocument(base, { axes: [{ field: 'frequencyHz', values: [2.45e9] }] }, sweepFixtureMeta).points[0];
		if (revision.status !== 'sized') throw new Error('expected a sized point');
		for (const p of points) {
			expect(patch(p).lengthMm).toBeCloseTo(patch(revision).lengthMm, 9);
			expect(patch(p).widthMm).toBeCloseTo(patch(revision).widthMm, 9);
			expect((p.derived.feed as unknown as { insetDepthMm: number }).insetDepthMm).toBeCloseTo((revision.derived.feed as unknown as { insetDepthMm: number }).insetDepthMm, 9);
			expect(p.board).toEqual(revision.board);
		}
		// the material does vary
		expect(points.map((p) => p.stack.find((l) => l.kind === 'dielectric')).map((l) => (l as { relativePermittivity: number }).relativePermittivity)).toEqual([3.3, 3.55, 3.8]);
	});

	it('a resize εr sweep (and a plan without a mode, as stored before modes) changes the patch length', () => {
		for (const plan of [{ mode: 'resize', axes: [permittivity] }, { axes: [permittivity] }]) {
			const lengths = sized(buildSweepDocument(base, plan, sweepFixtureMeta)).map((p) => patch(p).lengthMm);
			// higher εr, shorter patch (a half guided wavelength: Balanis, Antenna Theory 4th ed., eq. 14-7, from memory)
			expect(lengths[0]).toBeGreaterThan(lengths[1]);
			expect(lengths[1]).toBeGreaterThan(lengths[2]);
		}
	});

	it('a hold-geometry h sweep keeps the ground margin and so the board', () => {
		const points = sized(buildSweepDocument(base, { mode: 'hold-geometry', axes: [{ field: 'substrate.heightMm', values: [1.0, 1.524, 2.0] }] }, sweepFixtureMeta));
		expect(new Set(points.map((p) => JSON.stringify(p.board))).size).toBe(1);
		expect(new Set(points.map((p) => patch(p).lengthMm)).size).toBe(1);
	});

	it('a geometry sweep of the patch length keeps the width and inset depth, whatever the mode', () => {
		const points = sized(buildSweepDocument(base, { axes: [{ field: 'overrides.lengthMm', values: [31, 32, 33] }] }, sweepFixtureMeta));
		expect(points.map((p) => patch(p).lengthMm)).toEqual([31, 32, 33]);
		expect(new Set(points.map((p) => patch(p).widthMm)).size).toBe(1);
		expect(new Set(points.map((p) => (p.derived.feed as unknown as { insetDepthMm: number }).insetDepthMm)).size).toBe(1);
	});

	it('a geometry sweep of the probe offset moves the probe port and nothing else of the patch', () => {
		const points = sized(buildSweepDocument(designDocument('rectangular', 'probe'), { axes: [{ field: 'overrides.probeOffsetMm', values: [4, 6] }] }, sweepFixtureMeta));
		expect(points[1].solverSetup.ports[0].location[1] - points[0].solverSetup.ports[0].location[1]).toBeCloseTo(2, 9);
		expect(patch(points[0])).toEqual(patch(points[1]));
	});

	it('refuses hold-geometry for a patch whose geometry takes no overrides, naming plan.mode', () => {
		expect(() => buildSweepDocument(designDocument('truncated-corner', 'probe'), { mode: 'hold-geometry', axes: [permittivity] }, sweepFixtureMeta)).toThrow(InputError);
		try {
			buildSweepDocument(designDocument('truncated-corner', 'probe'), { mode: 'hold-geometry', axes: [permittivity] }, sweepFixtureMeta);
		} catch (e) {
			expect((e as InputError).first.path).toBe('plan.mode');
		}
	});

	it('refuses an unknown mode', () => {
		expect(() => buildSweepDocument(base, { mode: 'keep', axes: [permittivity] }, sweepFixtureMeta)).toThrow(InputError);
	});
});
