// Secrets for e-mailed links (password reset, invitation): 256 random bits; only their sha256 is stored.
import { createHash, randomBytes } from 'node:crypto';

export function createLinkToken(): { token: string; tokenHash: string } {
	const token = randomBytes(32).toString('base64url');
	return { token, tokenHash: hashLinkToken(token) };
}

export function hashLinkToken(token: string): string {
	return createHash('sha256').update(token).digest('hex');
}
