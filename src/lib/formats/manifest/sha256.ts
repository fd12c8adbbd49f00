// SHA-256 as lowercase hex through the platform's Web Crypto (`crypto.subtle.digest`: every browser, and Node.js 20 as a global).
// The one hash of the house: manifests, export records and download headers all use it.

const encoder = new TextEncoder();

/** Lowercase hex SHA-256 digest of the bytes (a string is hashed as its UTF-8 bytes). */
export async function sha256Hex(data: Uint8Array | string): Promise<string> {
	const bytes = typeof data === 'string' ? encoder.encode(data) : data;
	const digest = await globalThis.crypto.subtle.digest('SHA-256', bytes as Uint8Array<ArrayBuffer>);
	return Array.from(new Uint8Array(digest), (b) => b.toString(16).padStart(2, '0')).join('');
}
