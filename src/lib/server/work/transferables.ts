// The byte arrays of a message worth moving between threads instead of copying.

/** Whole, large ArrayBuffers under `value` (each once); small ones, views into a larger buffer and Node's shared Buffer pool are copied. */
export function transferablesOf(value: unknown, out = new Set<ArrayBuffer>()): ArrayBuffer[] {
	if (value instanceof Uint8Array) {
		if (value.buffer instanceof ArrayBuffer && value.byteOffset === 0 && value.byteLength === value.buffer.byteLength && value.byteLength >= 64 * 1024) out.add(value.buffer);
	} else if (Array.isArray(value)) for (const v of value) transferablesOf(v, out);
	else if (value && typeof value === 'object') for (const v of Object.values(value)) transferablesOf(v, out);
	return [...out];
}
