// DXF entities → DXF text through dxf-writer, millimetres, numbers rounded to 1 nm so output never carries float noise.
import Drawing from 'dxf-writer';
import Handle from 'dxf-writer/src/Handle.js';
import { boundsOfPoints, emptyBounds } from '../../geometry';
import type { DxfCommand } from './commands';

const roundToNanometre = (v: number) => {
	const n = Math.round(v * 1e6) / 1e6;
	return n === 0 ? 0 : n;
};
const roundBulge = (v: number) => {
	const n = Math.round(v * 1e12) / 1e12;
	return n === 0 ? 0 : n;
};

export function serializeDxf(commands: readonly DxfCommand[]): string {
	// dxf-writer hands out entity handles from a counter shared by every drawing; restart it so each
	// file numbers its entities from the same point (the build is synchronous, so nothing interleaves).
	Handle.seed = 0;
	const drawing = new Drawing();
	drawing.setUnits('Millimeters');
	// Extents from the entities' points, circle boxes and text boxes (bulged edges of our contours never leave the board).
	let ext = emptyBounds;
	for (const c of commands) {
		if (c.type === 'circle') ext = boundsOfPoints([[c.center[0] - c.radiusMm, c.center[1] - c.radiusMm], [c.center[0] + c.radiusMm, c.center[1] + c.radiusMm]], ext);
		if (c.type === 'polyline') ext = boundsOfPoints(c.vertices.map((v) => v.at), ext);
		if (c.type === 'line') ext = boundsOfPoints([c.from, c.to], ext);
		if (c.type === 'text') ext = boundsOfPoints([c.at, [c.at[0] + c.widthMm, c.at[1] + c.heightMm]], ext);
	}
	if (Number.isFinite(ext.minXMm)) {
		drawing.header('EXTMIN', [[10, roundToNanometre(ext.minXMm)], [20, roundToNanometre(ext.minYMm)], [30, 0]]);
		drawing.header('EXTMAX', [[10, roundToNanometre(ext.maxXMm)], [20, roundToNanometre(ext.maxYMm)], [30, 0]]);
	}
	for (const c of commands) {
		if (c.type === 'layer') drawing.addLayer(c.name, c.colorIndex, 'CONTINUOUS');
	}
	for (const c of commands) {
		if (c.type === 'layer') continue;
		drawing.setActiveLayer(c.layer);
		if (c.type === 'circle') drawing.drawCircle(roundToNanometre(c.center[0]), roundToNanometre(c.center[1]), roundToNanometre(c.radiusMm));
		else if (c.type === 'line') drawing.drawLine(roundToNanometre(c.from[0]), roundToNanometre(c.from[1]), roundToNanometre(c.to[0]), roundToNanometre(c.to[1]));
		else if (c.type === 'text') drawing.drawText(roundToNanometre(c.at[0]), roundToNanometre(c.at[1]), roundToNanometre(c.heightMm), 0, c.value);
		else {
			const pts = c.vertices.map((v) => (v.bulge === 0 ? [roundToNanometre(v.at[0]), roundToNanometre(v.at[1])] : [roundToNanometre(v.at[0]), roundToNanometre(v.at[1]), roundBulge(v.bulge)]));
			drawing.drawPolyline(pts as unknown as [number, number][], c.closed);
		}
	}
	return drawing.toDxfString();
}
