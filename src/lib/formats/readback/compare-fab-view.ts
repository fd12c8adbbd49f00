// The fab's view against the artwork: every layer present once, same copper within 0.5 %, same extents, same holes.
import { createPolygonContour, type Bounds, type Region } from '../../geometry';
import type { Artwork, ArtworkDrill } from '../../artwork';
import { artworkImageItems, artworkStrokes, layerKeyOf } from './artwork-image';
import { READ_BACK_TOLERANCE as TOL, type FabHole, type FabPolygon, type FabView, type ReadBackMismatch } from './fab-view';
import { composeImage, differenceArea, imageArea, imagePerimeter } from './image-item';
import { strokeDifference, strokeInkArea, strokeInkBounds } from './stroke-ink';

const fmt = (v: number) => String(Math.round(v * 1e6) / 1e6);

function regionsOf(polygons: readonly FabPolygon[]): Region[] {
	return polygons.map((p) => ({ outer: createPolygonContour(p.outer), holes: p.holes.map((h) => createPolygonContour(h)) }));
}

function boundsDiffer(a: Bounds | null, b: Bounds | null): string | null {
	if (!a || !b) return a === b ? null : `${a ? 'has' : 'has no'} extents in the artwork but ${b ? 'has' : 'has none'} in the file`;
	const keys = ['minXMm', 'minYMm', 'maxXMm', 'maxYMm'] as const;
	const off = keys.filter((k) => Math.abs(a[k] - b[k]) > TOL.extentsMm);
	return off.length ? off.map((k) => `${k} ${fmt(a[k])} in the artwork, ${fmt(b[k])} in the file`).join('; ') : null;
}

function compareHoles(plated: boolean, drills: readonly ArtworkDrill[], holes: readonly FabHole[], fileName: string | null): ReadBackMismatch[] {
	const what = plated ? 'plated' : 'non-plated';
	const mismatch = (check: ReadBackMismatch['check'], message: string): ReadBackMismatch => ({ check, fileName, layerKey: null, message });
	if (drills.length !== holes.length) return [mismatch('drill-count', `${drills.length} ${what} holes in the artwork, ${holes.length} in the drill file`)];
	const want = drills.map((d) => d.diameterMm).sort((a, b) => a - b);
	const got = holes.map((h) => h.diameterMm).sort((a, b) => a - b);
	const bad = want.findIndex((d, i) => Math.abs(d - got[i]) > TOL.drillDiameterMm);
	if (bad >= 0) return [mismatch('drill-diameter', `a ${fmt(want[bad])} mm ${what} hole in the artwork is ${fmt(got[bad])} mm in the drill file`)];
	const unused = [...holes];
	const out: ReadBackMismatch[] = [];
	for (const d of drills) {
		const i = unused.findIndex((h) => Math.abs(h.diameterMm - d.diameterMm) <= TOL.drillDiameterMm && Math.hypot(h.xMm - d.center[0], h.yMm - d.center[1]) <= TOL.drillPositionMm);
		if (i < 0) out.push(mismatch('drill-position', `${d.id} at (${fmt(d.center[0])}, ${fmt(d.center[1])}) has no hole within 1 µm in the drill file`));
		else unused.splice(i, 1);
	}
	return out;
}

export function compareFabView(artwork: Artwork, view: FabView): ReadBackMismatch[] {
	const out: ReadBackMismatch[] = [...view.problems];
	const expectedKeys = new Set<string>();
	for (const layer of artwork.layers) {
		const key = layerKeyOf(layer.function);
		expectedKeys.add(key);
		const found = view.layers.filter((l) => l.key === key);
		const mismatch = (check: ReadBackMismatch['check'], message: string, fileName: string | null = found[0]?.fileName ?? null) => out.push({ check, fileName, layerKey: key, message });
		if (found.length === 0) {
			mismatch('layer-missing', `no file images ${key} (${layer.title})`, null);
			continue;
		}
		if (found.length > 1) {
			mismatch('layer-unexpected', `${found.length} files image ${key}: ${found.map((f) => f.fileName).join(', ')}`);
			continue; // which one a fab would use is anyone's guess
		}
		const file = found[0];
		if (key === 'profile') continue; // judged as the board below
		if (layer.function.kind === 'legend') {
			// a legend is strokes: compared stroke by stroke, point by point, and by its ink's area and extents
			const want = artworkStrokes(layer);
			const diff = strokeDifference(want, file.strokes ?? [], TOL.extentsMm, TOL.drillDiameterMm);
			if (diff) mismatch('layer-shape', `${key}: ${diff} (${file.fileName})`);
			const wantArea = strokeInkArea(want);
			if (Math.abs(file.areaMm2 - wantArea) > TOL.areaFraction * Math.max(wantArea, 1e-9)) mismatch('layer-area', `${key}: ${fmt(wantArea)} mm² of ink in the artwork, ${fmt(file.areaMm2)} mm² in ${file.fileName}`);
			const ext = boundsDiffer(strokeInkBounds(want), file.bounds);
			if (ext) mismatch('layer-extents', `${key}: ${ext}`);
			continue;
		}
		const want = composeImage(artworkImageItems(layer));
		const got = regionsOf(file.polygons);
		const gotArea = imageArea(got);
		const scale = Math.max(want.areaMm2, 1e-9);
		if (Math.abs(gotArea - want.areaMm2) > TOL.areaFraction * scale) {
			mismatch('layer-area', `${key}: ${fmt(want.areaMm2)} mm² in the artwork, ${fmt(gotArea)} mm² in ${file.fileName}`);
		}
		// copper in one image and not the other, allowed as if every edge had moved by the extents tolerance
		const xor = differenceArea(want.regions, got);
		const allowed = Math.min(TOL.areaFraction * scale, imagePerimeter(want.regions) * TOL.extentsMm);
		if (xor > allowed) mismatch('layer-shape', `${key}: ${fmt(xor)} mm² differ between the artwork and ${file.fileName} (allowed ${fmt(allowed)} mm²)`);
		const ext = boundsDiffer(want.bounds, file.bounds);
		if (ext) mismatch('layer-extents', `${key}: ${ext}`);
	}
	for (const l of view.layers) {
		if (!expectedKeys.has(l.key)) out.push({ check: 'layer-unexpected', fileName: l.fileName, layerKey: l.key, message: `${l.fileName} images ${l.key}, which the artwork does not have` });
	}
	const { widthMm: w, lengthMm: l } = artwork.board;
	if (!view.board) out.push({ check: 'board-extents', fileName: null, layerKey: 'profile', message: 'no board outline was read from a profile file' });
	else {
		const ext = boundsDiffer({ minXMm: 0, minYMm: 0, maxXMm: w, maxYMm: l }, view.board);
		if (ext) out.push({ check: 'board-extents', fileName: view.layers.find((x) => x.key === 'profile')?.fileName ?? null, layerKey: 'profile', message: `board outline: ${ext}` });
	}
	for (const plated of [true, false]) {
		const drills = artwork.drills.filter((d) => d.plated === plated);
		const files = view.drills.filter((d) => d.plated === plated);
		if (drills.length > 0 && files.length === 0) {
			out.push({ check: 'layer-missing', fileName: null, layerKey: null, message: `no ${plated ? 'plated' : 'non-plated'} drill file for ${drills.length} holes` });
			continue;
		}
		for (const m of compareHoles(plated, drills, files.flatMap((f) => f.holes), files[0]?.fileName ?? null)) out.push(m);
	}
	return out;
}
