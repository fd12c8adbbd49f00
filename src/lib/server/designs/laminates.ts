// A team's laminate library: the built-in presets first, then the team's own, each validated on the way in.
import { randomUUID } from 'node:crypto';
import type { Kysely } from 'kysely';
import { InputError, parseWith } from '../../schemas/input-error';
import { laminateInputSchema, laminatePropertiesSchema, type LaminateClass, type LaminateProperties } from '../../schemas/laminate';
import type { Database } from '../db/database';
import * as laminateQueries from '../db/laminate.queries';
import { laminatePresets } from './laminate-presets';

export interface Laminate {
	id: string;
	name: string;
	properties: LaminateProperties;
	/** True for the presets that come with the product (not editable, not stored per team). */
	builtIn: boolean;
	/** For a preset: the material class its typical values come from, with ranges and source. */
	materialClass?: LaminateClass;
}

export async function listLaminates(db: Kysely<Database>, teamId: string): Promise<Laminate[]> {
	const rows = await laminateQueries.listLaminatesByTeam(db, teamId);
	const own = rows.map((r): Laminate => ({ id: r.id, name: r.name, properties: laminatePropertiesSchema.parse(r.properties), builtIn: false }));
	return [...laminatePresets.map((p) => ({ ...p, builtIn: true })), ...own];
}

/** Adds a laminate to a team's library; bad values or a name already taken are an InputError. */
export async function addLaminate(db: Kysely<Database>, opts: { teamId: string; userId: string; raw: unknown }): Promise<Laminate> {
	const input = parseWith(laminateInputSchema, opts.raw);
	const taken = laminatePresets.some((p) => p.name === input.name) || (await laminateQueries.findLaminateByTeamAndName(db, opts.teamId, input.name));
	if (taken) throw new InputError([{ path: 'name', value: input.name, message: 'a laminate with this name is already in the library' }]);
	const id = randomUUID();
	try {
		await laminateQueries.insertLaminate(db, { id, team_id: opts.teamId, name: input.name, properties: JSON.stringify(input.properties), created_by: opts.userId });
	} catch (err) {
		// Two people adding the same name at once: the unique constraint decides.
		if ((err as { code?: string }).code === '23505') throw new InputError([{ path: 'name', value: input.name, message: 'a laminate with this name is already in the library' }]);
		throw err;
	}
	return { id, name: input.name, properties: input.properties, builtIn: false };
}
