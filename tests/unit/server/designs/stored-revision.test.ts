// Revision JSON read back from PostgreSQL is parsed through the schemas of its concepts: every fixture design round-trips
// through JSON, and a stored revision that no longer parses is an error naming the revision and the field.
import { describe, expect, it } from 'vitest';
import { size } from '../../../../src/lib/rf';
import { parseDesignInput } from '../../../../src/lib/schemas';
import { parseStoredInput, parseStoredResults, StoredRevisionError } from '../../../../src/lib/server/designs/stored-revision';
import { allShapeFeedCases, designDocument } from '../../../fixtures/designs/design-cases';
import { layeredCases } from '../../../fixtures/designs/layered-cases';

const revision = { id: '3f1c2a9e-0000-4000-8000-000000000001', label: 'C' };
const stored = (v: unknown) => JSON.parse(JSON.stringify(v));
const fixtures = [...allShapeFeedCases.map((c) => ({ name: `${c.shape} ${c.feed}`, doc: designDocument(c.shape, c.feed) })), ...layeredCases.map((c) => ({ name: c.name, doc: c.doc }))];

describe('a stored revision', () => {
	it.each(fixtures)('parses back for the fixture design $name', ({ doc }) => {
		const input = parseDesignInput(doc);
		const sized = size(input);
		expect(parseStoredInput(stored(input), revision)).toEqual(input);
		expect(parseStoredResults(stored(sized), revision)).toEqual(stored(sized));
	});

	it('that no longer parses is an error naming the revision, the column and the field', () => {
		const sized = stored(size(parseDesignInput(designDocument('rectangular', 'inset'))));
		const broken = { ...sized, patch: { ...sized.patch, kind: 'hexagonal' } };
		expect(() => parseStoredResults(broken, revision)).toThrow(StoredRevisionError);
		expect(() => parseStoredResults(broken, revision)).toThrow(/^Stored revision C \(3f1c2a9e-0000-4000-8000-000000000001\) no longer parses: results\.patch\.kind: /);
		expect(() => parseStoredInput({ ...sized.input, frequencyHz: -1 }, revision)).toThrow(/no longer parses: input\.frequencyHz: /);
	});

	it('stored before control characters were refused parses with them replaced, as the writers replace them', () => {
		const input = parseDesignInput(designDocument('rectangular', 'inset'));
		const sized = stored(size(input));
		const hostile = 'Pier\u0001sensor';
		expect(() => parseDesignInput({ ...input, name: hostile })).toThrow();
		expect(parseStoredInput({ ...stored(input), name: hostile }, revision).name).not.toContain('\u0001');
		expect(parseStoredResults({ ...sized, input: { ...sized.input, name: hostile } }, revision).input.name).not.toContain('\u0001');
	});
});
