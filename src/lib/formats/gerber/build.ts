// Artwork layer → Gerber command list: X2 header, apertures, then each shape as a region, flash or stroked outline.
import type { Artwork, ArtworkLayer, ArtworkShape } from '../../artwork';
import type { Contour, Point } from '../../geometry';
import { SOFTWARE_NAME, type ExportMeta } from '../export-meta';
import { GERBER_COORDINATE_FORMAT, type GerberCommand } from './commands';

/** %TF.FileFunction values for a layer (Gerber spec §5.6.3). */
export function gerberFileFunction(layer: ArtworkLayer): string[] {
	const f = layer.function;
	switch (f.kind) {
		case 'copper':
			return ['Copper', `L${f.copperIndex}`, f.side === 'top' ? 'Top' : f.side === 'bottom' ? 'Bot' : 'Inr'];
		case 'profile':
			return ['Profile', 'NP'];
		case 'solder-mask':
			return ['Soldermask', f.side === 'top' ? 'Top' : 'Bot'];
		case 'legend':
			return ['Legend', f.side === 'top' ? 'Top' : 'Bot'];
	}
}

/** Aperture function of a flashed or stroked shape (Gerber spec §5.6.10), by role. */
function apertureFunction(shape: ArtworkShape, layer: ArtworkLayer): string | null {
	if (layer.function.kind === 'solder-mask' || layer.function.kind === 'legend') return null;
	switch (shape.role) {
		case 'probe-pad':
			return 'ComponentPad';
		case 'clearance':
			return 'AntiPad';
		case 'profile':
			return 'Profile';
		case 'coupling-slot':
			// a clear cut in the ground plane: no copper, so no conductor function
			return null;
		default:
			return 'Conductor';
	}
}

const fmtKey = (d: number) => d.toFixed(6);

export function buildGerberCommands(artwork: Artwork, layerId: string, meta: ExportMeta): GerberCommand[] {
	const layer = artwork.layers.find((l) => l.id === layerId);
	if (!layer) throw new Error(`no layer "${layerId}" in the artwork`);
	const out: GerberCommand[] = [];
	const fileValues = (name: string, values: string[]) => out.push({ type: 'attribute', scope: 'file', name, values });
	const file = (name: string, ...values: string[]) => fileValues(name, values);
	out.push({ type: 'comment', text: `${SOFTWARE_NAME} ${meta.designName} revision ${meta.revisionLabel}: ${layer.title}` });
	file('TF.GenerationSoftware', SOFTWARE_NAME, SOFTWARE_NAME, meta.softwareVersion);
	file('TF.CreationDate', `${meta.revisionDate}T00:00:00+00:00`);
	file('TF.ProjectId', meta.designSlug, projectGuid(meta), meta.revisionLabel);
	file('TF.SameCoordinates', `${meta.designSlug}-${meta.revisionLabel}`);
	fileValues('TF.FileFunction', gerberFileFunction(layer));
	file('TF.FilePolarity', layer.function.kind === 'solder-mask' ? 'Negative' : 'Positive');
	file('TF.Part', 'Single');
	out.push({ type: 'format', format: GERBER_COORDINATE_FORMAT });
	out.push({ type: 'units', units: 'mm' });

	// Apertures: one per (diameter, function), numbered from D10 in order of first use.
	const apertures = new Map<string, number>();
	const apertureFor = (diameterMm: number, fn: string | null) => `${fmtKey(diameterMm)}|${fn ?? ''}`;
	for (const shape of layer.shapes) {
		const g = shape.geometry;
		const d = g.kind === 'circle' ? g.diameterMm : g.kind === 'outline' || g.kind === 'stroke' ? g.strokeWidthMm : null;
		if (d === null) continue;
		const fn = apertureFunction(shape, layer);
		const key = apertureFor(d, fn);
		if (apertures.has(key)) continue;
		const code = 10 + apertures.size;
		apertures.set(key, code);
		if (fn) out.push({ type: 'attribute', scope: 'aperture', name: 'TA.AperFunction', values: [fn] });
		out.push({ type: 'define-circle-aperture', code, diameterMm: d });
		if (fn) out.push({ type: 'attribute', scope: 'delete', name: 'TD.AperFunction', values: [] });
	}
	out.push({ type: 'multi-quadrant' });

	let polarity: 'dark' | 'clear' | null = null;
	let mode: 'linear' | 'clockwise' | 'counter-clockwise' | null = null;
	let current: number | null = null;
	const setMode = (m: typeof mode & string) => {
		if (mode !== m) out.push({ type: 'interpolation', mode: m });
		mode = m;
	};
	const trace = (contour: Contour) => {
		out.push({ type: 'move', to: contour.start });
		let from: Point = contour.start;
		for (const seg of contour.segments) {
			if (seg.kind === 'line') {
				setMode('linear');
				out.push({ type: 'line', to: seg.to });
			} else {
				setMode(seg.clockwise ? 'clockwise' : 'counter-clockwise');
				out.push({ type: 'arc', to: seg.to, centerOffset: [seg.center[0] - from[0], seg.center[1] - from[1]] });
			}
			from = seg.to;
		}
	};

	for (const shape of layer.shapes) {
		if (polarity !== shape.polarity) out.push({ type: 'polarity', polarity: shape.polarity });
		polarity = shape.polarity;
		const g = shape.geometry;
		const fn = apertureFunction(shape, layer);
		if (g.kind === 'region') {
			if (fn) out.push({ type: 'attribute', scope: 'aperture', name: 'TA.AperFunction', values: [fn] });
			// Gerber fills every contour of a region, so holes cannot be extra contours (spec §4.10):
			// each hole is drawn as its own region in the opposite polarity right after the outer one.
			for (const contour of [g.region.outer, ...g.region.holes]) {
				out.push({ type: 'region-start' });
				trace(contour);
				out.push({ type: 'region-end' });
				if (g.region.holes.length > 0 && contour === g.region.outer) {
					out.push({ type: 'polarity', polarity: shape.polarity === 'dark' ? 'clear' : 'dark' });
				}
			}
			if (g.region.holes.length > 0) out.push({ type: 'polarity', polarity: shape.polarity });
			if (fn) out.push({ type: 'attribute', scope: 'delete', name: 'TD.AperFunction', values: [] });
		} else {
			const d = g.kind === 'circle' ? g.diameterMm : g.strokeWidthMm;
			const code = apertures.get(apertureFor(d, fn))!;
			if (current !== code) out.push({ type: 'select-aperture', code });
			current = code;
			if (g.kind === 'circle') out.push({ type: 'flash', at: g.center });
			else if (g.kind === 'outline') trace(g.contour);
			else {
				out.push({ type: 'move', to: g.points[0] });
				setMode('linear');
				for (const p of g.points.slice(1)) out.push({ type: 'line', to: p });
			}
		}
	}
	out.push({ type: 'end' });
	return out;
}

/**
 * ProjectId needs a GUID (RFC 4122 form); we derive a stable one from slug and revision with a
 * 32-bit FNV-1a hash (repeated with four seeds), so the same revision always gets the same id.
 */
function projectGuid(meta: ExportMeta): string {
	const text = `${meta.designSlug}/${meta.revisionLabel}`;
	const hex = [0x811c9dc5, 0x01000193, 0x050c5d1f, 0x0a3d70a3]
		.map((seed) => {
			let h = seed >>> 0;
			for (let i = 0; i < text.length; i++) {
				h ^= text.charCodeAt(i);
				h = Math.imul(h, 0x01000193) >>> 0;
			}
			return h.toString(16).padStart(8, '0');
		})
		.join('');
	const v = `${hex.slice(0, 12)}4${hex.slice(13, 16)}${((parseInt(hex[16], 16) & 0x3) | 0x8).toString(16)}${hex.slice(17)}`;
	return `${v.slice(0, 8)}-${v.slice(8, 12)}-${v.slice(12, 16)}-${v.slice(16, 20)}-${v.slice(20, 32)}`;
}
