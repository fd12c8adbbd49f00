// A value as JSON with object keys sorted (and undefined members dropped, as JSON does): equal values, equal text,
// whatever order their keys were written in (PostgreSQL's jsonb reorders them).

export function canonicalJson(value: unknown): string {
	return JSON.stringify(value, (_key, v: unknown) =>
		v && typeof v === 'object' && !Array.isArray(v) ? Object.fromEntries(Object.entries(v as Record<string, unknown>).sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0))) : v
	);
}
