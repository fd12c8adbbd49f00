// Arrays across the pitches practitioners use (0.6–1.0 λ0): the corporate feed builds with no copper collision, or the refusal names the short pitch and the smallest one that builds.
import { describe, expect, it } from 'vitest';
import { buildArtwork, type Artwork } from '../../../src/lib/artwork';
import { checkArtwork } from '../../../src/lib/drc';
import { GeometryError } from '../../../src/lib/geometry';
import { size } from '../../../src/lib/rf';
import { parseDesignInput, type DesignInputDocument } from '../../../src/lib/schemas';
import { STANDARD_QUICK_TURN_PROFILE } from '../../../src/lib/schemas/fab-profile';
import { touchGraph } from './copper-graph';

/** Demo laminates: a PTFE-glass class board (εr 2.2, 0.787 mm) at 5.8 GHz and a glass-epoxy class board (εr 4.4, 1.6 mm) at 2.45 GHz. */
const LAMINATES = {
	'εr 2.2, 0.787 mm, 5.8 GHz': { frequencyHz: 5.8e9, substrate: { relativePermittivity: 2.2, heightMm: 0.787, lossTangent: 0.0009 } },
	'εr 4.4, 1.6 mm, 2.45 GHz': { frequencyHz: 2.45e9, substrate: { relativePermittivity: 4.4, heightMm: 1.6, lossTangent: 0.02 } }
} as const;

function arrayDoc(laminate: keyof typeof LAMINATES, columns: number, rows: number, sx: number, sy = sx): DesignInputDocument {
	return { name: 'Pitch demo', feed: 'inset', ...LAMINATES[laminate], array: { columns, rows, spacingXWavelengths: sx, spacingYWavelengths: sy } } as DesignInputDocument;
}

const build = (doc: DesignInputDocument): Artwork => buildArtwork(size(parseDesignInput(doc)));

/**
 * No copper collision: the quick-turn design rules pass (spacing between separate copper), and on the
 * feed layer each element's copper touches exactly one network piece (its own arm), so no line shorts
 * to a neighbour.
 */
function expectNoCollision(a: Artwork): void {
	expect(checkArtwork(a, STANDARD_QUICK_TURN_PROFILE)).toEqual([]);
	const top = a.layers.find((l) => l.id === 'copper-top')!;
	const graph = touchGraph(top.shapes);
	const prefixes = new Set(top.shapes.map((s) => /^e\d+-\d+-/.exec(s.id)?.[0]).filter((p): p is string => p !== undefined));
	for (const prefix of prefixes) {
		const own = top.shapes.filter((s) => s.id.startsWith(prefix));
		const contacts = new Set(own.flatMap((s) => [...graph.get(s.id)!]).filter((id) => !id.startsWith(prefix)));
		expect([...contacts], `${prefix} touches only its own arm`).toHaveLength(1);
		expect([...contacts][0]).toMatch(/^net-/);
	}
}

describe('a 4 × 1 array at 5.8 GHz on 0.787 mm εr 2.2 (refused at every pitch from 0.7 to 0.85 λ0 before the feed was checked against each shape)', () => {
	it.each([0.7, 0.75, 0.8, 0.85])('builds at %s λ0 with no copper collision', (s) => {
		const a = build(arrayDoc('εr 2.2, 0.787 mm, 5.8 GHz', 4, 1, s));
		expect(a.layers.find((l) => l.id === 'copper-top')!.shapes.filter((x) => x.id.endsWith('-patch'))).toHaveLength(4);
		expectNoCollision(a);
	});
});

describe('2 × 2 and 4 × 4 arrays from 0.6 to 1.0 λ0', () => {
	const cases = (Object.keys(LAMINATES) as (keyof typeof LAMINATES)[]).flatMap((lam) =>
		[2, 4].flatMap((n) => [0.6, 0.7, 0.8, 0.9, 1.0].map((s) => [lam, n, n, s] as const))
	);
	it.each(cases)('%s, %i × %i at %s λ0: builds with no collision, or names the short pitch and the smallest that builds', (lam, n, _rows, s) => {
		let artwork: Artwork | null = null;
		try {
			artwork = build(arrayDoc(lam, n, n, s));
		} catch (e) {
			expect(e).toBeInstanceOf(GeometryError);
			const m = /^array\.(spacing[XY]Wavelengths) ([\d.]+) gives a pitch of [\d.]+ mm along [xy], too short: .+; the smallest \1 that builds here is ([\d.]+) \([\d.]+ mm\)$/.exec((e as Error).message);
			expect(m, (e as Error).message).not.toBeNull();
			const smallest = Number(m![3]);
			expect(smallest).toBeGreaterThan(s);
			// the pitch the refusal names does build, with no collision
			const fixed = m![1] === 'spacingXWavelengths' ? arrayDoc(lam, n, n, smallest, s) : arrayDoc(lam, n, n, s, smallest);
			expectNoCollision(build(fixed));
			return;
		}
		expectNoCollision(artwork);
	});

	it('builds every one of them on the glass-epoxy board, and the 2 × 2 from 0.7 λ0 on the PTFE-class board', () => {
		for (const s of [0.6, 0.7, 0.8, 0.9, 1.0]) {
			expect(() => build(arrayDoc('εr 4.4, 1.6 mm, 2.45 GHz', 2, 2, s))).not.toThrow();
			expect(() => build(arrayDoc('εr 4.4, 1.6 mm, 2.45 GHz', 4, 4, s))).not.toThrow();
		}
		for (const s of [0.7, 0.8, 0.9, 1.0]) expect(() => build(arrayDoc('εr 2.2, 0.787 mm, 5.8 GHz', 2, 2, s))).not.toThrow();
	});
});
