// Personal API tokens: made for one team, shown once, stored as sha256 only, listed and revoked by their owner.
import { randomUUID } from 'node:crypto';
import { generateSecret, hashSecret } from '../auth/api-token';
import { getDb } from '../db';
import * as tokenQueries from '../db/token.queries';
import * as limitQueries from '../db/limits.queries';
import { recordAuditEvent } from '../audit/record-audit-event';
import { LIMITS, tokenLimitMessage } from '../http/limits';
import { parseWith } from '$lib/schemas/input-error';
import { createTokenSchema } from '$lib/schemas/account';
import { AccountError } from './account-error';

export interface ApiTokenSummary {
	id: string;
	name: string;
	teamId: string;
	teamName: string;
	createdAt: Date;
	lastUsedAt: Date | null;
}

/** Returns the secret: the only time it exists outside the caller's hands. */
export async function createApiToken(userId: string, teamId: string, raw: { name: unknown }): Promise<{ id: string; name: string; secret: string }> {
	const { name } = parseWith(createTokenSchema, raw);
	const secret = generateSecret();
	const id = randomUUID();
	await getDb()
		.transaction()
		.execute(async (trx) => {
			await limitQueries.lockUserById(trx, userId);
			if ((await limitQueries.countLiveTokensByUser(trx, userId)) >= LIMITS.liveTokensPerPerson) throw new AccountError('limit-reached', tokenLimitMessage);
			await tokenQueries.insertApiToken(trx, { id, team_id: teamId, user_id: userId, name, token_hash: hashSecret(secret) });
			await recordAuditEvent({ kind: 'token.created', teamId, actorUserId: userId, details: { tokenId: id, name } }, trx);
		});
	return { id, name, secret };
}

export async function listApiTokens(userId: string): Promise<ApiTokenSummary[]> {
	const rows = await tokenQueries.listLiveTokensByUser(getDb(), userId);
	return rows.map((r) => ({ id: r.id, name: r.name, teamId: r.team_id, teamName: r.team_name, createdAt: r.created_at, lastUsedAt: r.last_used_at }));
}

/** The team a person's live token belongs to (the route authorises against it), or null. */
export async function findOwnApiTokenTeam(userId: string, tokenId: string): Promise<string | null> {
	const row = await tokenQueries.findTokenByIdAndUser(getDb(), tokenId, userId);
	return row && !row.revoked_at ? row.team_id : null;
}

export async function revokeApiToken(userId: string, tokenId: string, now = new Date()): Promise<void> {
	await getDb()
		.transaction()
		.execute(async (trx) => {
			const token = await tokenQueries.findTokenByIdAndUser(trx, tokenId, userId);
			if (!token || !(await tokenQueries.revokeTokenByIdAndUser(trx, tokenId, userId, now))) throw new AccountError('not-found', 'Token not found');
			await recordAuditEvent({ kind: 'token.revoked', teamId: token.team_id, actorUserId: userId, details: { tokenId } }, trx);
		});
}
