// The full-wave model → the engine's XML (openEMS: <openEMS><FDTD/><ContinuousStructure/></openEMS>).
import { mFromMm, powerRatioFromDb } from '../units';
import type { FieldModel, ModelPrimitive, ModelProperty } from './types';

/** The engine's file names for the port's voltage and current time series. */
export const PORT_VOLTAGE_FILE = 'port_ut1';
export const PORT_CURRENT_FILE = 'port_it1';
/**
 * Frequency-domain near-field dumps on the six faces of the near-field box (HDF5, for the engine's
 * far-field tool): the engine writes one file per face, `<name>_<face>.h5`, faces 0–5 in the order
 * x-min, x-max, y-min, y-max, z-min, z-max.
 */
export const NEAR_FIELD_E_DUMP = 'nearbox_E';
export const NEAR_FIELD_H_DUMP = 'nearbox_H';
/** The near-field dump file of one face (0–5) as the engine names it. */
export const nearFieldDumpFile = (dump: string, face: number) => `${dump}_${face}.h5`;

/** Fixed number formatting: 12 significant digits, shortest form, never "-0". */
export function formatNumber(value: number): string {
	if (!Number.isFinite(value)) throw new RangeError(`cannot write ${value} to the model`);
	const v = Number(value.toPrecision(12));
	return Object.is(v, -0) ? '0' : String(v);
}

const esc = (text: string) => text.replace(/&/g, '&amp;').replace(/"/g, '&quot;').replace(/</g, '&lt;');
const attrs = (pairs: Record<string, string | number>) =>
	Object.entries(pairs)
		.map(([k, v]) => `${k}="${typeof v === 'number' ? formatNumber(v) : esc(v)}"`)
		.join(' ');
const point = (tag: string, p: readonly number[]) => `<${tag} ${attrs({ X: p[0], Y: p[1], Z: p[2] })}/>`;
const lines = (values: readonly number[]) => values.map(formatNumber).join(',');
const triple = (a: number, b: number, c: number) => `${formatNumber(a)},${formatNumber(b)},${formatNumber(c)}`;

function primitive(p: ModelPrimitive, indent: string): string[] {
	switch (p.kind) {
		case 'box':
			return [`${indent}<Box ${attrs({ Priority: p.priority })}>`, `${indent}  ${point('P1', p.fromMm)}`, `${indent}  ${point('P2', p.toMm)}`, `${indent}</Box>`];
		case 'polygon': {
			// NormDir 2 = z; vertices are (X1, X2) = (x, y) in the plane at Elevation
			const tag = p.thicknessMm > 0 ? 'LinPoly' : 'Polygon';
			const extra: Record<string, number> = p.thicknessMm > 0 ? { Length: p.thicknessMm } : {};
			return [
				`${indent}<${tag} ${attrs({ Priority: p.priority, Elevation: p.zMm, NormDir: 2, QtyVertices: p.pointsMm.length, ...extra })}>`,
				...p.pointsMm.map((v) => `${indent}  <Vertex ${attrs({ X1: v[0], X2: v[1] })}/>`),
				`${indent}</${tag}>`
			];
		}
		case 'cylinder':
			return [
				`${indent}<Cylinder ${attrs({ Priority: p.priority, Radius: p.radiusMm })}>`,
				`${indent}  ${point('P1', [p.centerMm[0], p.centerMm[1], p.fromZMm])}`,
				`${indent}  ${point('P2', [p.centerMm[0], p.centerMm[1], p.toZMm])}`,
				`${indent}</Cylinder>`
			];
		case 'cylindrical-shell':
			return [
				`${indent}<CylindricalShell ${attrs({ Priority: p.priority, Radius: p.radiusMm, ShellWidth: p.wallMm })}>`,
				`${indent}  ${point('P1', [p.centerMm[0], p.centerMm[1], p.fromZMm])}`,
				`${indent}  ${point('P2', [p.centerMm[0], p.centerMm[1], p.toZMm])}`,
				`${indent}</CylindricalShell>`
			];
	}
}

function property(prop: ModelProperty, id: number): string[] {
	const body = ['      <Primitives>', ...prop.primitives.flatMap((p) => primitive(p, '        ')), '      </Primitives>'];
	switch (prop.kind) {
		case 'dielectric':
			return [
				`    <Material ${attrs({ ID: id, Name: prop.name, Isotropy: 1 })}>`,
				...body,
				`      <Property Epsilon="${triple(prop.relativePermittivity, 1, 1)}" Mue="1,1,1" Kappa="${triple(prop.conductivitySPerM, 0, 0)}" Sigma="0,0,0"/>`,
				`    </Material>`
			];
		case 'sheet':
			// the engine takes the sheet's thickness in metres
			return [`    <ConductingSheet ${attrs({ ID: id, Name: prop.name, Conductivity: prop.conductivitySPerM, Thickness: mFromMm(prop.thicknessMm) })}>`, ...body, `    </ConductingSheet>`];
		case 'pec':
			return [`    <Metal ${attrs({ ID: id, Name: prop.name })}>`, ...body, `    </Metal>`];
	}
}

/** The lumped port as the engine's own port helper builds it: resistor, excitation, voltage and current probes. */
function portProperties(model: FieldModel, firstId: number): string[] {
	const { fromMm: a, toMm: b, referenceImpedanceOhm } = model.port;
	const box = (from: readonly number[], to: readonly number[], priority: number, indent = '        ') => [
		`${indent}<Box ${attrs({ Priority: priority })}>`,
		`${indent}  ${point('P1', from)}`,
		`${indent}  ${point('P2', to)}`,
		`${indent}</Box>`
	];
	const midZ = (a[2] + b[2]) / 2;
	const centre = [(a[0] + b[0]) / 2, (a[1] + b[1]) / 2];
	return [
		// Direction 2 = z; Caps=1 joins the resistor to the metal at both ends
		`    <LumpedElement ${attrs({ ID: firstId, Name: 'port_resist_1', Direction: 2, Caps: 1, R: referenceImpedanceOhm })}>`,
		'      <Primitives>',
		...box(a, b, 5),
		'      </Primitives>',
		'    </LumpedElement>',
		// a soft voltage source pointing from the signal side down to ground (the engine's convention)
		`    <Excitation ${attrs({ ID: firstId + 1, Name: 'port_excite_1', Number: 0, Type: 0, Excite: '0,0,-1' })}>`,
		'      <Primitives>',
		...box(a, b, 5),
		'      </Primitives>',
		'    </Excitation>',
		`    <ProbeBox ${attrs({ ID: firstId + 2, Name: PORT_VOLTAGE_FILE, Number: 0, Type: 0, Weight: -1 })}>`,
		'      <Primitives>',
		...box([centre[0], centre[1], a[2]], [centre[0], centre[1], b[2]], 0),
		'      </Primitives>',
		'    </ProbeBox>',
		`    <ProbeBox ${attrs({ ID: firstId + 3, Name: PORT_CURRENT_FILE, Number: 0, Type: 1, Weight: 1, NormDir: 2 })}>`,
		'      <Primitives>',
		...box([a[0], a[1], midZ], [b[0], b[1], midZ], 0),
		'      </Primitives>',
		'    </ProbeBox>'
	];
}

function nearFieldDumps(model: FieldModel, firstId: number): string[] {
	const nf = model.nearFieldBox;
	if (!nf) return [];
	const [x0, y0, z0] = nf.fromMm;
	const [x1, y1, z1] = nf.toMm;
	const faces: [number[], number[]][] = [
		[[x0, y0, z0], [x0, y1, z1]],
		[[x1, y0, z0], [x1, y1, z1]],
		[[x0, y0, z0], [x1, y0, z1]],
		[[x0, y1, z0], [x1, y1, z1]],
		[[x0, y0, z0], [x1, y1, z0]],
		[[x0, y0, z1], [x1, y1, z1]]
	];
	// DumpType 10/11 = E/H phasors at FD_Samples (a running DFT); DumpMode 1 = cell-interpolated; FileType 1 = HDF5
	return [NEAR_FIELD_E_DUMP, NEAR_FIELD_H_DUMP].flatMap((name, i) => [
		`    <DumpBox ${attrs({ ID: firstId + i, Name: name, DumpType: 10 + i, DumpMode: 1, FileType: 1 })}>`,
		'      <Primitives>',
		...faces.flatMap(([from, to]) => [`        <Box Priority="0">`, `          ${point('P1', from)}`, `          ${point('P2', to)}`, `        </Box>`]),
		'      </Primitives>',
		`      <FD_Samples>${lines(nf.frequenciesHz)}</FD_Samples>`,
		'    </DumpBox>'
	]);
}

/** Serialises the model as the XML the engine reads; deterministic (fixed number formatting and order). */
export function serializeFieldModel(model: FieldModel): string {
	const boundary = model.boundary;
	const props = model.properties.flatMap((p, i) => property(p, i));
	const portId = model.properties.length;
	const out = [
		'<?xml version="1.0" encoding="UTF-8"?>',
		`<!-- Fringefield Field check model: mode ${model.mode}, refinement ${formatNumber(model.refinement)}, target ${formatNumber(model.targetFrequencyHz)} Hz; dielectric loss as conductivity at ${formatNumber(model.lossReferenceHz)} Hz -->`,
		'<openEMS>',
		`  <FDTD ${attrs({ NumberOfTimesteps: model.maxTimesteps, endCriteria: powerRatioFromDb(model.endCriterionDb), f_max: model.band.highHz, OverSampling: 1 })}>`,
		// Type 0 = Gaussian pulse, centre f0, 20 dB half-bandwidth fc
		`    <Excitation ${attrs({ Type: 0, f0: model.excitation.centerHz, fc: model.excitation.cutoffHz })}/>`,
		`    <BoundaryCond ${attrs({ xmin: boundary, xmax: boundary, ymin: boundary, ymax: boundary, zmin: boundary, zmax: boundary })}/>`,
		'  </FDTD>',
		'  <ContinuousStructure CoordSystem="0">',
		'    <RectilinearGrid DeltaUnit="0.001" CoordSystem="0">',
		`      <XLines>${lines(model.mesh.xMm)}</XLines>`,
		`      <YLines>${lines(model.mesh.yMm)}</YLines>`,
		`      <ZLines>${lines(model.mesh.zMm)}</ZLines>`,
		'    </RectilinearGrid>',
		'    <BackgroundMaterial Epsilon="1" Mue="1" Kappa="0" Sigma="0"/>',
		'    <Properties>',
		...props.map((l) => `  ${l}`),
		...portProperties(model, portId).map((l) => `  ${l}`),
		...nearFieldDumps(model, portId + 4).map((l) => `  ${l}`),
		'    </Properties>',
		'  </ContinuousStructure>',
		'</openEMS>',
		''
	];
	return out.join('\n');
}
