// The cache for work derived from immutable revisions: one computation per key, bounded, failures forgotten.
import { describe, expect, it } from 'vitest';
import { createImmutableCache } from '../../../../src/lib/server/exports/immutable-cache';

const sizeOfString = (s: string) => s.length;

describe('createImmutableCache', () => {
	it('computes a key once, also for concurrent callers', async () => {
		const cache = createImmutableCache<string>({ maxEntries: 4, maxBytes: 1000, sizeOf: sizeOfString });
		let runs = 0;
		const compute = async () => {
			runs++;
			await new Promise((r) => setTimeout(r, 5));
			return 'bytes';
		};
		const results = await Promise.all([cache.get('a', compute), cache.get('a', compute), cache.get('a', compute)]);
		expect(results).toEqual(['bytes', 'bytes', 'bytes']);
		expect(await cache.get('a', compute)).toBe('bytes');
		expect(runs).toBe(1);
	});

	it('forgets a failed computation so the next caller tries again', async () => {
		const cache = createImmutableCache<string>({ maxEntries: 4, maxBytes: 1000, sizeOf: sizeOfString });
		await expect(cache.get('k', async () => Promise.reject(new Error('database down')))).rejects.toThrow('database down');
		expect(await cache.get('k', async () => 'ok')).toBe('ok');
	});

	it('evicts the least recently used entry past the entry limit', async () => {
		const cache = createImmutableCache<string>({ maxEntries: 2, maxBytes: 1000, sizeOf: sizeOfString });
		let runs = 0;
		const make = (v: string) => async () => {
			runs++;
			return v;
		};
		await cache.get('a', make('A'));
		await cache.get('b', make('B'));
		await cache.get('a', make('A')); // a is now the most recent
		await cache.get('c', make('C')); // evicts b
		await Promise.resolve();
		expect(cache.size).toBe(2);
		runs = 0;
		await cache.get('a', make('A'));
		expect(runs).toBe(0);
		await cache.get('b', make('B'));
		expect(runs).toBe(1);
	});

	it('evicts past the byte limit', async () => {
		const cache = createImmutableCache<string>({ maxEntries: 10, maxBytes: 10, sizeOf: sizeOfString });
		await cache.get('a', async () => 'xxxxxx');
		await cache.get('b', async () => 'yyyyyy');
		await new Promise((r) => setTimeout(r, 0));
		expect(cache.size).toBe(1);
	});

	it('keeps the newest value even when it alone is over the byte limit, until another one pushes it out', async () => {
		const cache = createImmutableCache<string>({ maxEntries: 10, maxBytes: 10, sizeOf: sizeOfString });
		let runs = 0;
		const big = async () => {
			runs++;
			return 'z'.repeat(50);
		};
		await cache.get('big', big);
		await new Promise((r) => setTimeout(r, 0));
		expect(cache.size).toBe(1);
		await cache.get('big', big);
		expect(runs).toBe(1);
		await cache.get('small', async () => 'ok');
		await new Promise((r) => setTimeout(r, 0));
		await cache.get('big', big);
		expect(runs).toBe(2);
	});
});
