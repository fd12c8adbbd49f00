// Creating a team (its creator becomes its owner), renaming it, and the teams a person belongs to.
import { randomUUID } from 'node:crypto';
import { getDb } from '../db';
import * as memberQueries from '../db/member.queries';
import * as limitQueries from '../db/limits.queries';
import { LIMITS, teamLimitMessage } from '../http/limits';
import { AccountError } from './account-error';
import { parseWith } from '$lib/schemas/input-error';
import { createTeamSchema } from '$lib/schemas/account';

export async function createTeam(userId: string, raw: { name: unknown }): Promise<{ id: string; name: string }> {
	const { name } = parseWith(createTeamSchema, raw);
	const id = randomUUID();
	await getDb()
		.transaction()
		.execute(async (trx) => {
			await limitQueries.lockUserById(trx, userId);
			if ((await limitQueries.countTeamsByUser(trx, userId)) >= LIMITS.teamsPerPerson) throw new AccountError('limit-reached', teamLimitMessage);
			await memberQueries.insertTeam(trx, id, name);
			await memberQueries.insertMember(trx, id, userId, 'owner');
		});
	return { id, name };
}

export async function renameTeam(teamId: string, raw: { name: unknown }): Promise<void> {
	const { name } = parseWith(createTeamSchema, raw);
	await memberQueries.renameTeamById(getDb(), teamId, name);
}

export async function findTeam(teamId: string) {
	return memberQueries.findTeamById(getDb(), teamId);
}
