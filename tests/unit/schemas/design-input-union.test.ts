// The design input as a union on its feed: every document the product has written or ships parses, carries only its
// own feed's option object, and parses from its older stored form (where every document held an inset and a probe
// object whatever its feed) to the very same value. The reference for that older form is the parser before the union
// (git history of src/lib/schemas/design-input.ts: `inset` defaulted to {}, `probe` to drill 1.3 mm, clearance 4.1 mm);
// the writer goldens (tests/unit/formats/golden) hold the bytes the sized designs must still give.
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { demoDesigns } from '../../../scripts/lib/seed-designs';
import { size } from '../../../src/lib/rf';
import { allFeedKinds, designInputOutline, feedOptionKeys, InputError, parseDesignInput, sharedFieldsOf, type DesignInput } from '../../../src/lib/schemas';
import { goldenDesign } from '../../fixtures/bundle/golden-bundle';
import { allShapeFeedCases, designDocument } from '../../fixtures/designs/design-cases';
import { layeredCases } from '../../fixtures/designs/layered-cases';
import { fieldCheckRuns } from '../../fixtures/rf/field-check-runs';
import { sweepFixtureCases } from '../../fixtures/sweep/sweep-cases';

const FIXTURES = join(__dirname, '../../fixtures');
const readJson = (path: string) => JSON.parse(readFileSync(path, 'utf8')) as Record<string, unknown>;
const folders = (dir: string) => readdirSync(join(FIXTURES, dir), { withFileTypes: true }).filter((e) => e.isDirectory()).map((e) => join(FIXTURES, dir, e.name));

/** Every design document of the demo data and of tests/fixtures, by where it comes from. */
const documents: [string, unknown][] = [
	...demoDesigns().flatMap((d) => d.revisions.map((r, i): [string, unknown] => [`demo: ${d.name}, revision ${i + 1}`, r.input])),
	...allShapeFeedCases.map(({ shape, feed }): [string, unknown] => [`designs/design-cases: ${shape} ${feed}`, designDocument(shape, feed)]),
	...layeredCases.map((c): [string, unknown] => [`designs/layered-cases: ${c.name}`, c.doc]),
	['bundle/golden-bundle', goldenDesign],
	...fieldCheckRuns.map((r): [string, unknown] => [`rf/field-check-runs: ${r.document.name}`, r.document]),
	...sweepFixtureCases.map((c): [string, unknown] => [`sweep/sweep-cases: ${c.file}`, c.base]),
	...readdirSync(join(FIXTURES, 'sweep'))
		.filter((f) => f.endsWith('.json'))
		.map((f): [string, unknown] => [`sweep/${f} base`, readJson(join(FIXTURES, 'sweep', f)).base]),
	...folders('writers').flatMap((dir) =>
		readdirSync(dir)
			.filter((f) => f.endsWith('.sweep.json'))
			.map((f): [string, unknown] => [`writers/${f} base`, readJson(join(dir, f)).base])
	),
	...[...folders('simulation'), ...folders('simulation-validation')].map((dir): [string, unknown] => [`${dir.slice(FIXTURES.length + 1)}/input.json`, readJson(join(dir, 'input.json'))]),
	...folders('step').map((dir): [string, unknown] => [`${dir.slice(FIXTURES.length + 1)}/input.json design`, readJson(join(dir, 'input.json')).design])
];

const optionKeys = ['inset', 'probe', 'slot', 'proximity'] as const;

/** The document as the parser before the union stored it: an inset and a probe object on every feed (its own values kept). */
function olderStoredForm(d: DesignInput): Record<string, unknown> {
	return { inset: {}, probe: { drillDiameterMm: 1.3, clearanceDiameterMm: 4.1 }, ...d };
}

describe('the design input as a union on its feed', () => {
	it('reads at least one document of every feed kind from the demo data and the fixtures', () => {
		const feeds = new Set(documents.map(([, doc]) => parseDesignInput(doc).feed));
		expect([...feeds].sort()).toEqual([...allFeedKinds].sort());
		expect(documents.length).toBeGreaterThan(40);
	});

	it.each(documents)('%s: parses, with only its own feed option object, and its older stored form parses to the same value', (_source, doc) => {
		const parsed = parseDesignInput(doc);
		const own = feedOptionKeys[parsed.feed];
		expect(optionKeys.filter((k) => k !== own && k in parsed)).toEqual([]);
		if (parsed.feed === 'inset' || parsed.feed === 'probe') expect(parsed).toHaveProperty(parsed.feed);
		const older = parseDesignInput(olderStoredForm(parsed));
		expect(older).toEqual(parsed);
		expect(JSON.stringify(size(older))).toBe(JSON.stringify(size(parsed)));
		// the outline (the published JSON Schema's source) still accepts the parsed document
		expect(designInputOutline.safeParse(parsed).success).toBe(true);
	});

	it('keeps the outline key order in the parsed document, so the files that print it keep their bytes', () => {
		const outlineOrder = Object.keys(designInputOutline.shape);
		for (const [, doc] of documents) {
			const keys = Object.keys(parseDesignInput(doc));
			expect(keys).toEqual(outlineOrder.filter((k) => keys.includes(k)));
		}
	});

	it('drops the option object of another feed, however it is filled', () => {
		const doc = { ...designDocument('rectangular', 'edge'), inset: { notchGapMm: 0.5 }, probe: { drillDiameterMm: 0.9, clearanceDiameterMm: 2.6, model: 'solid-pin' } };
		const parsed = parseDesignInput(doc);
		expect(parsed.feed).toBe('edge');
		expect('inset' in parsed || 'probe' in parsed).toBe(false);
		// a probe object that was never valid is dropped too: it cannot apply to an inset feed
		expect(parseDesignInput({ ...designDocument('rectangular', 'inset'), probe: { drillDiameterMm: 5, clearanceDiameterMm: 1 } }).feed).toBe('inset');
	});

	it('keeps its own option object with its defaults filled', () => {
		const parsed = parseDesignInput(designDocument('rectangular', 'probe'));
		expect(parsed.feed === 'probe' && parsed.probe).toEqual({ drillDiameterMm: 1.3, clearanceDiameterMm: 4.1 });
		const inset = parseDesignInput(designDocument('rectangular', 'inset', { inset: { notchGapMm: 0.4 } }));
		expect(inset.feed === 'inset' && inset.inset).toEqual({ notchGapMm: 0.4 });
	});

	it('defaults the feed to inset, as before', () => {
		const { feed: _feed, ...bare } = designDocument('rectangular', 'inset');
		void _feed;
		expect(parseDesignInput(bare)).toMatchObject({ feed: 'inset', inset: {} });
	});

	// Each row: the document, the field path the error must name, a fragment of the message.
	const refused: [string, unknown, string, RegExp][] = [
		['a slot on an edge feed', { ...designDocument('rectangular', 'edge'), slot: { lengthMm: 10 } }, 'slot', /only an aperture-coupled feed takes slot options/],
		['proximity options on an inset feed', { ...designDocument('rectangular', 'inset'), proximity: { overlapMm: 2 } }, 'proximity', /only a proximity-coupled feed takes proximity options/],
		['an unknown feed', { ...designDocument('rectangular', 'inset'), feed: 'coax' }, 'feed', /must be one of: inset, probe, edge, quarter-wave, aperture-coupled, proximity-coupled/],
		['a feed that is not a string', { ...designDocument('rectangular', 'inset'), feed: 3 }, 'feed', /must be one of/],
		['a probe clearance not larger than its drill', designDocument('rectangular', 'probe', { probe: { drillDiameterMm: 2, clearanceDiameterMm: 2 } }), 'probe.clearanceDiameterMm', /larger than probe.drillDiameterMm/],
		['a bad value in its own option object', designDocument('rectangular', 'inset', { inset: { notchGapMm: -1 } }), 'inset.notchGapMm', /allowed range/],
		['an unknown field beside the feed', { ...designDocument('rectangular', 'edge'), bogus: 1 }, '', /unknown field\(s\): bogus/],
		['an inset depth override on a probe feed', designDocument('rectangular', 'probe', { overrides: { insetDepthMm: 3 } }), 'overrides.insetDepthMm', /only an inset feed/]
	];
	it.each(refused)('refuses %s with the field path', (_label, doc, path, message) => {
		let caught: unknown;
		try {
			parseDesignInput(doc);
		} catch (e) {
			caught = e;
		}
		expect(caught).toBeInstanceOf(InputError);
		const issue = (caught as InputError).issues.find((i) => i.path === path);
		expect(issue, JSON.stringify((caught as InputError).issues)).toBeDefined();
		expect(issue!.message).toMatch(message);
	});

	it('gives every feed the same shared fields (sharedFieldsOf removes only the feed option object)', () => {
		for (const [, doc] of documents) {
			const parsed = parseDesignInput(doc);
			const shared = sharedFieldsOf(parsed);
			expect(optionKeys.filter((k) => k in shared)).toEqual([]);
			expect(Object.keys(shared).length).toBe(Object.keys(parsed).length - (feedOptionKeys[parsed.feed] && feedOptionKeys[parsed.feed]! in parsed ? 1 : 0));
		}
	});
});
