// A small in-process LRU for work derived from immutable revisions: the same key always yields the same value,
// so a cached value is never stale; concurrent callers of one key share one computation. Failures are not kept.

export interface ImmutableCache<T> {
	get(key: string, compute: () => Promise<T>): Promise<T>;
	readonly size: number;
	clear(): void;
}

export function createImmutableCache<T>(opts: { maxEntries: number; maxBytes: number; sizeOf: (value: T) => number }): ImmutableCache<T> {
	const entries = new Map<string, { value: Promise<T>; bytes: number }>();
	let totalBytes = 0;

	function evict(): void {
		for (const [key, entry] of entries) {
			if (entries.size <= opts.maxEntries && totalBytes <= opts.maxBytes) break;
			// the newest value stays even when it alone is over the byte limit: dropping it at once would make every
			// request for it (a 64 × 64 array's bundle, minutes of work) build it again
			if (entries.size === 1) break;
			entries.delete(key);
			totalBytes -= entry.bytes;
		}
	}

	return {
		get(key, compute) {
			const hit = entries.get(key);
			if (hit) {
				entries.delete(key);
				entries.set(key, hit);
				return hit.value;
			}
			const entry = { value: compute(), bytes: 0 };
			entries.set(key, entry);
			entry.value.then(
				(value) => {
					if (entries.get(key) !== entry) return;
					entry.bytes = opts.sizeOf(value);
					totalBytes += entry.bytes;
					evict();
				},
				() => {
					if (entries.get(key) === entry) entries.delete(key);
				}
			);
			return entry.value;
		},
		get size() {
			return entries.size;
		},
		clear() {
			entries.clear();
			totalBytes = 0;
		}
	};
}
