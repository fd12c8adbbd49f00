// Mesh rules of the Field check model: thirds rule at metal edges, λ/20 in the dielectric, ≥ 4 cells per layer, grading ≤ 1.4.
import { describe, expect, it } from 'vitest';
import { buildArtwork } from '../../../src/lib/artwork';
import { CELLS_PER_WAVELENGTH, EDGE_CELL_FRACTION, MAX_GRADING_RATIO, MIN_CELLS_PER_LAYER, buildAxis, largestGradingRatio, meshStatistics, thirdsLines } from '../../../src/lib/simulation';
import { fixtureCases, fixtureInput, fixtureModel } from './fixture-cases';
import { sizeDocument } from '../../fixtures/designs/size-document';

const C_MM_PER_S = 299_792_458_000;
const hasLine = (lines: readonly number[], at: number) => lines.some((l) => Math.abs(l - at) < 1e-6);
const cells = (lines: readonly number[]) => lines.slice(1).map((l, i) => l - lines[i]);

interface Case {
	frequencyHz: number;
	substrate: { relativePermittivity: number; heightMm: number };
}

describe('Field check mesh', () => {
	it('puts the thirds-rule pair ⅓·d inside and ⅔·d outside a metal edge (openEMS documentation, the thirds rule; from memory)', () => {
		expect(thirdsLines({ positionMm: 10, metalSide: -1 }, 0.9)).toEqual([9.7, 10.6]);
		expect(thirdsLines({ positionMm: 10, metalSide: 1 }, 0.9)).toEqual([10.3, 9.4]);
	});

	it.each(fixtureCases())('%s: a mesh line at each patch edge’s one-third/two-thirds points', (name) => {
		const model = fixtureModel(name);
		const input = fixtureInput(name) as Case;
		const sized = sizeDocument(input);
		const artwork = buildArtwork(sized);
		const patch = artwork.layers[0].shapes.find((s) => s.role === 'patch')!;
		const d = ((C_MM_PER_S / (input.frequencyHz * 1.3 * Math.sqrt(input.substrate.relativePermittivity))) / CELLS_PER_WAVELENGTH.standard) * EDGE_CELL_FRACTION;
		// the patch's outermost edges on both axes (metal inside)
		const g = patch.geometry;
		const [cx, cy] = [artwork.board.widthMm / 2, artwork.board.lengthMm / 2];
		const half = g.kind === 'circle' ? [g.diameterMm / 2, g.diameterMm / 2] : sized.patch.kind === 'rectangular' ? [sized.patch.widthMm / 2, sized.patch.lengthMm / 2] : [(sized.patch as { radiusMm: number }).radiusMm, (sized.patch as { radiusMm: number }).radiusMm];
		for (const [lines, centre, h] of [[model.mesh.xMm, cx, half[0]], [model.mesh.yMm, cy, half[1]]] as const) {
			expect(hasLine(lines, centre - h + d / 3), `inside ${centre - h}`).toBe(true);
			expect(hasLine(lines, centre - h - (2 * d) / 3), `outside ${centre - h}`).toBe(true);
			expect(hasLine(lines, centre + h - d / 3), `inside ${centre + h}`).toBe(true);
			expect(hasLine(lines, centre + h + (2 * d) / 3), `outside ${centre + h}`).toBe(true);
		}
	});

	it.each(fixtureCases().flatMap((name) => [[name, 'quick', 1], [name, 'standard', 1], [name, 'accurate', 1.5]] as const))('%s %s ×%s: no cell over the board larger than λ/N in the dielectric', (name, mode, refinement) => {
		const model = fixtureModel(name, mode, refinement);
		const input = fixtureInput(name) as Case;
		const sized = sizeDocument(input);
		const board = [sized.ground.widthMm, sized.ground.lengthMm];
		// λ in the dielectric at the top of the check band (target + 30 %), divided by the mode's cells per wavelength
		const limitMm = C_MM_PER_S / (input.frequencyHz * 1.3 * Math.sqrt(input.substrate.relativePermittivity)) / (CELLS_PER_WAVELENGTH[mode] * refinement);
		if (mode === 'standard') expect(CELLS_PER_WAVELENGTH[mode]).toBe(20);
		[model.mesh.xMm, model.mesh.yMm].forEach((lines, axis) => {
			const over = cells(lines).filter((c, i) => lines[i] >= 0 && lines[i + 1] <= board[axis]);
			expect(Math.max(...over)).toBeLessThanOrEqual(limitMm * (1 + 1e-9));
		});
	});

	it.each(fixtureCases().flatMap((name) => [[name, 'quick', 1], [name, 'standard', 1], [name, 'accurate', 1.5]] as const))('%s %s ×%s: the mode’s fewest cells through the dielectric (4 quick, 8 standard) and neighbouring cells within 1.4×', (name, mode, refinement) => {
		const model = fixtureModel(name, mode, refinement);
		const sheetZ = model.properties.filter((p) => p.kind === 'sheet').map((p) => (p.primitives[0] as { zMm: number }).zMm);
		const [bottom, top] = [Math.min(...sheetZ), Math.max(...sheetZ)];
		const inside = model.mesh.zMm.filter((z) => z >= bottom - 1e-9 && z <= top + 1e-9);
		expect(inside.length - 1).toBeGreaterThanOrEqual(Math.ceil(MIN_CELLS_PER_LAYER[mode] * refinement));
		expect(inside.length - 1).toBeGreaterThanOrEqual(mode === 'quick' ? 4 : 8);
		// common practice for FDTD meshes, no source: neighbouring cells differ by at most 1.4×
		for (const lines of [model.mesh.xMm, model.mesh.yMm, model.mesh.zMm]) expect(largestGradingRatio(lines)).toBeLessThanOrEqual(MAX_GRADING_RATIO);
	});

	it('refines: accurate mode’s second mesh has more cells and smaller largest cells than standard', () => {
		const standard = meshStatistics(fixtureModel('rectangular-inset', 'standard').mesh);
		const refined = meshStatistics(fixtureModel('rectangular-inset', 'accurate', 1.5).mesh);
		expect(refined.cellCount).toBeGreaterThan(standard.cellCount * 2);
		expect(refined.largestCellMm).toBeLessThan(standard.largestCellMm);
	});

	it('grades an axis between a fine feature and coarse air without breaking the 1.4 ratio or the limits', () => {
		const lines = buildAxis({ fromMm: -40, toMm: 80, edges: [{ positionMm: 0, metalSide: 1 }, { positionMm: 40, metalSide: -1 }], fixedMm: [20], fineFromMm: 0, fineToMm: 40 }, { maxFineCellMm: 2, maxAirCellMm: 8, edgeCellMm: 0.6 });
		expect(lines[0]).toBe(-40);
		expect(lines[lines.length - 1]).toBe(80);
		expect(hasLine(lines, 20)).toBe(true);
		expect(largestGradingRatio(lines)).toBeLessThanOrEqual(MAX_GRADING_RATIO);
		expect(Math.max(...cells(lines))).toBeLessThanOrEqual(8);
		const board = cells(lines).filter((c, i) => lines[i] >= 0 && lines[i + 1] <= 40);
		expect(Math.max(...board)).toBeLessThanOrEqual(2 + 1e-9);
	});
});
