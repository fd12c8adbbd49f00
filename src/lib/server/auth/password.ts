// Password hashing: argon2id with the OWASP Password Storage Cheat Sheet's first recommended
// configuration (m = 19 MiB, t = 2, p = 1).
import { hash, verify } from '@node-rs/argon2';

const ARGON2ID = 2; // Algorithm.Argon2id in @node-rs/argon2 (a const enum, so not importable under isolatedModules)
const OWASP_PARAMETERS = { algorithm: ARGON2ID, memoryCost: 19_456, timeCost: 2, parallelism: 1, outputLen: 32 } as const;

export function hashPassword(password: string): Promise<string> {
	return hash(password, OWASP_PARAMETERS);
}

export async function verifyPassword(passwordHash: string, password: string): Promise<boolean> {
	try {
		return await verify(passwordHash, password);
	} catch {
		return false;
	}
}
