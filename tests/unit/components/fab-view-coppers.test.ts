import { describe, expect, it } from 'vitest';
import { buildArtwork, type Artwork } from '../../../src/lib/artwork';
import { fabViewCoppers } from '../../../src/lib/components/fab-view-coppers';
import { createExportMeta } from '../../../src/lib/formats/export-meta';
import { toGerber } from '../../../src/lib/formats/gerber';
import { checkReadBack } from '../../../src/lib/formats/readback';
import { size } from '../../../src/lib/rf';
import { parseDesignInput, type DesignInputDocument } from '../../../src/lib/schemas';
import { layeredDocument, threeCopperStack } from '../../fixtures/designs/layered-cases';

const meta = createExportMeta({ designName: 'Fab view', revisionLabel: 'A', revisionDate: '2026-12-01' });

function artworkOf(doc: Partial<DesignInputDocument>): Artwork {
	return buildArtwork(size(parseDesignInput(doc)));
}

/** The view the fab view draws: our Gerber files, parsed back (as FabView.svelte does). */
function viewOf(artwork: Artwork) {
	return checkReadBack(
		artwork,
		artwork.layers.map((l) => ({ name: `${l.id}.gbr`, text: toGerber(artwork, l.id, meta) }))
	).view;
}

describe('fabViewCoppers', () => {
	it('names all three coppers of an aperture-coupled board, the ground as the inner layer 2', () => {
		const artwork = artworkOf(layeredDocument({ feed: 'aperture-coupled', stack: [...threeCopperStack] }));
		const coppers = fabViewCoppers(artwork, viewOf(artwork));
		// Drawing order: the ground plane underneath, the patch on L1, then the L3 feed outlined over it (it runs under the patch).
		expect(coppers.map((c) => [c.key, c.name, c.look])).toEqual([
			['copper-L2', 'L2 Inner copper (layer 2) (ground)', 'ground'],
			['copper-L1', 'L1 Top copper (patch)', 'top'],
			['copper-L3', 'L3 Bottom copper (feed)', 'other']
		]);
		for (const c of coppers) {
			expect(c.fileName).toMatch(/\.gbr$/);
			expect(c.areaMm2).toBeGreaterThan(0);
			expect(c.polygons.length).toBeGreaterThan(0);
		}
	});

	it('draws a two-copper board as its bottom ground and its top copper', () => {
		const artwork = artworkOf({ frequencyHz: 2.45e9, feed: 'inset', substrate: { relativePermittivity: 4.4, heightMm: 1.6 } });
		expect(fabViewCoppers(artwork, viewOf(artwork)).map((c) => c.name)).toEqual(['L2 Bottom copper (ground)', 'L1 Top copper (patch and feed)']);
	});

	it('keeps a copper whose file is missing, empty and without a file name, so the view still lists it', () => {
		const artwork = artworkOf(layeredDocument({ feed: 'aperture-coupled', stack: [...threeCopperStack] }));
		const view = viewOf(artwork);
		const coppers = fabViewCoppers(artwork, { ...view, layers: view.layers.filter((l) => l.key !== 'copper-L3') });
		expect(coppers.find((c) => c.key === 'copper-L3')).toMatchObject({ fileName: null, areaMm2: 0, polygons: [] });
	});
});
