// The DOM-free SVG serializer against svg.js 3.2.8 on svgdom 0.1.29 (the outside reference): the same bytes for every design, and linear time.
import { createSVGWindow } from 'svgdom';
import { describe, expect, it } from 'vitest';
import { buildArtwork } from '../../../../src/lib/artwork';
import { createExportMeta } from '../../../../src/lib/formats/export-meta';
import { buildSvgTree, serializeSvgText } from '../../../../src/lib/formats/svg';
import { serializeSvg, type SvgWindow } from './svgjs-reference';
import { allShapeFeedCases, designDocument } from '../../../fixtures/designs/design-cases';
import { layeredCases } from '../../../fixtures/designs/layered-cases';
import { sizeDocument } from '../../../fixtures/designs/size-document';

const window = createSVGWindow() as unknown as SvgWindow;
const docs = [
	...allShapeFeedCases.map((c) => ({ name: `${c.shape} / ${c.feed}`, doc: designDocument(c.shape, c.feed, { solderMask: true }) })),
	...layeredCases,
	// reserved characters in the design name reach the title and the title block
	{ name: 'a name with & < > "', doc: designDocument('circular', 'edge', { name: 'Tom & Jerry <"β">' }) }
];

describe('serializeSvgText', () => {
	it.each(docs)('writes the same bytes as svg.js for $name', ({ doc }) => {
		const sized = sizeDocument(doc);
		const meta = createExportMeta({ designName: sized.input.name, revisionLabel: 'C', revisionDate: '2026-12-02' });
		const tree = buildSvgTree(buildArtwork(sized), meta);
		expect(serializeSvgText(tree)).toBe(serializeSvg(tree, window));
	});

	it('writes lowercase six-digit colours as svg.js does with a three-digit or uppercase hex fill', () => {
		const tree = { widthMm: 1, heightMm: 1, viewBox: [0, 0, 1, 1] as [number, number, number, number], children: [{ name: 'rect' as const, attributes: { fill: '#ABC', stroke: '#00FF00', id: 'ABCDEF' }, children: [] }] };
		expect(serializeSvgText(tree)).toBe(serializeSvg(tree, window));
	});
});
