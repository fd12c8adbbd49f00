// sha256 of bytes as lowercase hex (the export record's and the manifest's hash).
import { createHash } from 'node:crypto';

export function sha256Hex(bytes: Uint8Array | string): string {
	return createHash('sha256').update(bytes).digest('hex');
}
