// The engine's XML: golden files per case, read back by an independent XML parser (sax).
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import sax from 'sax';
import { describe, expect, it } from 'vitest';
import { serializeFieldModel, formatNumber } from '../../../src/lib/simulation';
import { FIXTURES, fixtureCases, fixtureInput, fixtureModel } from './fixture-cases';

interface Element {
	name: string;
	attributes: Record<string, string>;
	children: Element[];
	text: string;
}

/** The sax event handlers this test sets (sax ships no types; tests/unit/formats/svg/sax.d.ts declares the rest). */
interface EventParser {
	onopentag: (tag: { name: string; attributes: Record<string, string> }) => void;
	onclosetag: (name: string) => void;
	ontext: (text: string) => void;
	onerror: (e: Error) => void;
	write(text: string): { close(): unknown };
}

/** Parses XML strictly with sax (throws on malformed input) into a small element tree. */
function parseXml(text: string): Element {
	const parser = sax.parser(true) as unknown as EventParser;
	const root: Element = { name: '#document', attributes: {}, children: [], text: '' };
	const stack: Element[] = [root];
	parser.onopentag = (tag) => {
		const el: Element = { name: tag.name, attributes: tag.attributes, children: [], text: '' };
		stack[stack.length - 1].children.push(el);
		stack.push(el);
	};
	parser.onclosetag = () => void stack.pop();
	parser.ontext = (t) => {
		stack[stack.length - 1].text += t;
	};
	parser.onerror = (e) => {
		throw e;
	};
	parser.write(text).close();
	return root.children[0];
}

const all = (el: Element, name: string): Element[] => [...(el.name === name ? [el] : []), ...el.children.flatMap((c) => all(c, name))];
const one = (el: Element, name: string): Element => {
	const found = all(el, name);
	expect(found, name).toHaveLength(1);
	return found[0];
};

describe('serializeFieldModel', () => {
	it.each(fixtureCases())('writes the golden model of %s byte for byte', (name) => {
		const expected = readFileSync(join(FIXTURES, name, 'expected.xml'), 'utf8');
		expect(serializeFieldModel(fixtureModel(name))).toBe(expected);
	});

	it.each(fixtureCases())('writes %s as the XML the engine reads: FDTD settings, one grid, materials, a lumped port', (name) => {
		const doc = parseXml(serializeFieldModel(fixtureModel(name)));
		const input = fixtureInput(name) as { frequencyHz: number; substrate: { relativePermittivity: number; lossTangent: number } };
		expect(doc.name).toBe('openEMS');
		const fdtd = one(doc, 'FDTD');
		// −35 dB energy end criterion: 10^(−35/10) = 3.162e-4 (openEMS reads endCriteria as an energy ratio; openEMS
		// source, openems.cpp, "endCriteria"; from memory)
		expect(Number(fdtd.attributes.endCriteria)).toBeCloseTo(3.16227766e-4, 10);
		const exc = one(fdtd, 'Excitation');
		expect(exc.attributes.Type).toBe('0'); // Gaussian pulse
		expect(Number(exc.attributes.f0)).toBe(input.frequencyHz);
		// spans the check band target ± 30 %
		expect(Number(exc.attributes.fc)).toBeCloseTo(0.3 * input.frequencyHz, 0);
		const bc = one(fdtd, 'BoundaryCond');
		for (const face of ['xmin', 'xmax', 'ymin', 'ymax', 'zmin', 'zmax']) expect(bc.attributes[face]).toBe('MUR');
		const grid = one(doc, 'RectilinearGrid');
		expect(grid.attributes.DeltaUnit).toBe('0.001'); // millimetres
		for (const axis of ['XLines', 'YLines', 'ZLines']) {
			const lines = one(grid, axis).text.split(',').map(Number);
			expect(lines.every(Number.isFinite)).toBe(true);
			expect(lines.every((l, i) => i === 0 || l > lines[i - 1])).toBe(true);
		}
		const material = one(doc, 'Material');
		const property = one(material, 'Property');
		expect(Number(property.attributes.Epsilon.split(',')[0])).toBe(input.substrate.relativePermittivity);
		// κ = 2π·f·ε0·εr·tanδ at the target (the loss tangent's conductivity equivalent; Pozar, Microwave Engineering 4th ed., eq. 1.62; from memory)
		const kappa = 2 * Math.PI * input.frequencyHz * 8.8541878128e-12 * input.substrate.relativePermittivity * input.substrate.lossTangent;
		expect(Number(property.attributes.Kappa.split(',')[0]) / kappa).toBeCloseTo(1, 9);
		const sheets = all(doc, 'ConductingSheet');
		expect(sheets.map((s) => s.attributes.Name)).toEqual(['copper-top', 'copper-ground']);
		for (const s of sheets) expect(Number(s.attributes.Thickness)).toBeCloseTo(35e-6, 12);
		const resistor = one(doc, 'LumpedElement');
		expect(resistor.attributes.R).toBe('50');
		expect(resistor.attributes.Direction).toBe('2');
		expect(all(doc, 'ProbeBox').map((p) => p.attributes.Name)).toEqual(['port_ut1', 'port_it1']);
	});

	// the engine's own probe-fed patch (openEMS 0.0.35, Tutorials/Simple_Patch_Antenna.m) feeds the patch on a line from
	// the ground to the patch: a wire on one mesh line, with no face near the ground that could form a capacitor across the port
	it.each(['rectangular-probe', 'circular-probe'])('models the probe of %s as a conducting wire on the port’s mesh line above a one-cell port', (name) => {
		const model = fixtureModel(name);
		const doc = parseXml(serializeFieldModel(model));
		const metal = one(doc, 'Metal');
		expect(all(metal, 'Cylinder')).toHaveLength(0); // the solid pin and the plated barrel alike
		const wire = one(metal, 'Box');
		const p1 = one(wire, 'P1').attributes;
		const p2 = one(wire, 'P2').attributes;
		const [px, py, groundZ] = model.port.fromMm;
		for (const p of [p1, p2]) {
			expect(Number(p.X)).toBeCloseTo(px, 9);
			expect(Number(p.Y)).toBeCloseTo(py, 9);
		}
		expect(model.mesh.xMm.some((x) => Math.abs(x - px) < 1e-9) && model.mesh.yMm.some((y) => Math.abs(y - py) < 1e-9)).toBe(true);
		// the wire runs from the port's top (one z cell above the ground) to the patch, the top face of the dielectric
		const firstCell = model.mesh.zMm.find((z) => z > groundZ + 1e-9)! - groundZ;
		expect(model.port.toMm[2] - groundZ).toBeCloseTo(firstCell, 9);
		expect(Number(p1.Z)).toBeCloseTo(model.port.toMm[2], 9);
		const substrate = model.properties.find((p) => p.kind === 'dielectric')!.primitives[0];
		expect(substrate.kind === 'box' && Number(p2.Z)).toBeCloseTo(substrate.kind === 'box' ? substrate.toMm[2] : NaN, 9);
	});

	it('models a line feed without a pin', () => {
		expect(all(parseXml(serializeFieldModel(fixtureModel('rectangular-inset'))), 'Metal')).toHaveLength(0);
	});

	it.each(fixtureCases())('records %s on a near-field box around the board at the target frequency, for the far-field transform', (name) => {
		const model = fixtureModel(name);
		const input = fixtureInput(name) as { frequencyHz: number };
		const doc = parseXml(serializeFieldModel(model));
		const dumps = all(doc, 'DumpBox');
		// DumpType 10/11: E/H phasors at FD_Samples, FileType 1: HDF5 (CSXCAD's AddDump, as Debian's python3-openems nf2ff.py records its box)
		expect(dumps.map((d) => [d.attributes.Name, d.attributes.DumpType, d.attributes.FileType])).toEqual([
			['nearbox_E', '10', '1'],
			['nearbox_H', '11', '1']
		]);
		for (const d of dumps) {
			expect(Number(one(d, 'FD_Samples').text)).toBe(input.frequencyHz);
			const faces = all(d, 'Box').map((b) => ['P1', 'P2'].map((p) => ['X', 'Y', 'Z'].map((k) => Number(one(b, p).attributes[k]))));
			expect(faces).toHaveLength(6);
			// each face is flat along its own axis (x-min, x-max, y-min, y-max, z-min, z-max)
			faces.forEach(([from, to], i) => expect(from[Math.floor(i / 2)]).toBe(to[Math.floor(i / 2)]));
		}
		const box = model.nearFieldBox!;
		const mesh = [model.mesh.xMm, model.mesh.yMm, model.mesh.zMm];
		const board = all(one(doc, 'Material'), 'Box')[0];
		for (let axis = 0; axis < 3; axis++) {
			const lines = mesh[axis];
			// on mesh lines, strictly inside the absorbing boundaries, around the whole board (dielectric and copper)
			expect(lines).toContain(box.fromMm[axis]);
			expect(lines).toContain(box.toMm[axis]);
			expect(box.fromMm[axis]).toBeGreaterThan(lines[0]);
			expect(box.toMm[axis]).toBeLessThan(lines[lines.length - 1]);
			const key = ['X', 'Y', 'Z'][axis];
			expect(box.fromMm[axis]).toBeLessThan(Number(one(board, 'P1').attributes[key]));
			expect(box.toMm[axis]).toBeGreaterThan(Number(one(board, 'P2').attributes[key]));
		}
	});

	it('writes no near-field box when the far field is not wanted', () => {
		const base = fixtureModel('rectangular-probe');
		expect(serializeFieldModel({ ...base, nearFieldBox: null })).not.toContain('DumpBox');
	});

	it('formats numbers with 12 significant digits and never writes -0 or non-finite values', () => {
		expect(formatNumber(-0)).toBe('0');
		expect(formatNumber(1 / 3)).toBe('0.333333333333');
		expect(formatNumber(2.45e9)).toBe('2450000000');
		expect(() => formatNumber(Number.NaN)).toThrow(RangeError);
	});
});
