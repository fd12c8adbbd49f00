// SHA-256 (the platform's Web Crypto) checked against the FIPS 180-4 example vectors and node:crypto (the outside references).
import { createHash } from 'node:crypto';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { createExportMeta } from '../../../../src/lib/formats/export-meta';
import { buildManifest, hashFiles, sha256Hex } from '../../../../src/lib/formats/manifest';

const enc = new TextEncoder();

describe('sha256Hex', () => {
	it.each([
		// FIPS 180-4 / NIST CSRC example "abc"
		{ input: 'abc', hex: 'ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad' },
		// empty message
		{ input: '', hex: 'e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855' },
		// NIST two-block example
		{ input: 'abcdbcdecdefdefgefghfghighijhijkijkljklmklmnlmnomnopnopq', hex: '248d6a61d20638b8e5c026930c3e6039a33ce45964ff2167f6ecedd419db06c1' }
	])('hashes "$input" as in the NIST examples', async ({ input, hex }) => {
		expect(await sha256Hex(enc.encode(input))).toBe(hex);
		expect(await sha256Hex(input)).toBe(hex);
	});

	it('agrees with node:crypto on random byte strings of every padding length', async () => {
		await fc.assert(
			fc.asyncProperty(fc.uint8Array({ maxLength: 300 }), async (bytes) => {
				expect(await sha256Hex(bytes)).toBe(createHash('sha256').update(bytes).digest('hex'));
			}),
			{ numRuns: 200, seed: 7 }
		);
	});
});

describe('buildManifest', () => {
	it('lists every file with its size and hash', async () => {
		const meta = createExportMeta({ designName: 'X', revisionLabel: 'A', revisionDate: '2026-01-02' });
		const m = buildManifest(await hashFiles([{ name: 'a.txt', bytes: enc.encode('abc') }]), meta);
		expect(m.files).toEqual([{ name: 'a.txt', sizeBytes: 3, sha256: 'ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad' }]);
		expect(m.revisionDate).toBe('2026-01-02');
	});
});
