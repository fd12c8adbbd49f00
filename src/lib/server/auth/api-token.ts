// Personal API tokens: `ff_<random>` shown once; only the sha256 is stored; scoped to one team.
import { createHash, randomBytes } from 'node:crypto';

export const TOKEN_PREFIX = 'ff_';

export function generateSecret(): string {
	return TOKEN_PREFIX + randomBytes(24).toString('base64url');
}

export function hashSecret(secret: string): string {
	return createHash('sha256').update(secret).digest('hex');
}
