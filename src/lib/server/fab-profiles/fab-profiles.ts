// A team's fab profiles: the built-in one first (every team has it, no row), then the team's own, each validated on the way in and out.
import { randomUUID } from 'node:crypto';
import type { Kysely } from 'kysely';
import { copperLayerCountOf, designInputSchema } from '../../schemas/design-input';
import { InputError } from '../../schemas/input-error';
import { builtInFabProfileFor, parseFabProfile, STANDARD_MULTILAYER_PROFILE, STANDARD_QUICK_TURN_PROFILE, type FabProfile } from '../../schemas/fab-profile';
import type { Database } from '../db/database';
import * as fabProfileQueries from '../db/fab-profile.queries';

/** The id the built-in profile answers to in forms and lists (never a row id: rows use UUIDs). */
export const BUILT_IN_FAB_PROFILE_ID = 'built-in';

export interface TeamFabProfile {
	id: string;
	profile: FabProfile;
	/** True for the profile that comes with the product (not stored per team, not editable). */
	builtIn: boolean;
}

export const builtInFabProfile: TeamFabProfile = { id: BUILT_IN_FAB_PROFILE_ID, profile: STANDARD_QUICK_TURN_PROFILE, builtIn: true };

export async function listFabProfiles(db: Kysely<Database>, teamId: string): Promise<TeamFabProfile[]> {
	const rows = await fabProfileQueries.listFabProfilesByTeam(db, teamId);
	return [builtInFabProfile, ...rows.map((r) => ({ id: r.id, profile: parseFabProfile(r.properties), builtIn: false }))];
}

const nameTaken = (name: string) => new InputError([{ path: 'name', value: name, message: 'a fab profile with this name is already in the team’s list' }]);

/** Adds a profile to a team; bad values or a name already taken are an InputError (nothing written). */
export async function addFabProfile(db: Kysely<Database>, opts: { teamId: string; userId: string; raw: unknown }): Promise<TeamFabProfile> {
	const profile = parseFabProfile(opts.raw);
	if (profile.name === STANDARD_QUICK_TURN_PROFILE.name || profile.name === STANDARD_MULTILAYER_PROFILE.name || (await fabProfileQueries.findFabProfileByTeamAndName(db, opts.teamId, profile.name))) throw nameTaken(profile.name);
	const id = randomUUID();
	try {
		await fabProfileQueries.insertFabProfile(db, { id, team_id: opts.teamId, name: profile.name, properties: JSON.stringify(profile), created_by: opts.userId });
	} catch (err) {
		// Two people adding one name at once: the unique constraint decides.
		if ((err as { code?: string }).code === '23505') throw nameTaken(profile.name);
		throw err;
	}
	return { id, profile, builtIn: false };
}

/**
 * The values of the profile a form picked (the built-in, or one of the team's); an unknown id is an InputError.
 * The built-in choice is the built-in that can build the stack of `forDocument` (a design-input document;
 * one that does not validate is judged as two-copper, and its save refuses it anyway).
 */
export async function resolveFabProfileChoice(db: Kysely<Database>, teamId: string, id: string | null | undefined, forDocument?: unknown): Promise<FabProfile> {
	if (!id || id === BUILT_IN_FAB_PROFILE_ID) {
		const parsed = designInputSchema.safeParse(forDocument);
		return builtInFabProfileFor(parsed.success ? copperLayerCountOf(parsed.data) : 2);
	}
	const row = await fabProfileQueries.findFabProfileByTeamAndId(db, teamId, id);
	if (!row) throw new InputError([{ path: 'fabProfileId', value: id, message: 'must be the built-in profile or one of the team’s fab profiles' }]);
	return parseFabProfile(row.properties);
}

export interface RecordedFabProfile {
	profile: FabProfile;
	/** False for revisions older than the gate: nothing was recorded, the built-in is used. */
	recorded: boolean;
}

/**
 * The profile a revision recorded when it was saved; for older revisions, the built-in that can build a
 * stack of `copperLayerCount` coppers (two-layer unless told more).
 */
export async function revisionFabProfile(db: Kysely<Database>, revisionId: string, copperLayerCount = 2): Promise<RecordedFabProfile> {
	const stored = await fabProfileQueries.findFabProfileByRevisionId(db, revisionId);
	return stored ? { profile: parseFabProfile(stored), recorded: true } : { profile: builtInFabProfileFor(copperLayerCount), recorded: false };
}

/** Which of the team's profiles has these values (to preselect the parent's pick in a form); the built-in when none does. */
export function matchingFabProfileId(profiles: readonly TeamFabProfile[], profile: FabProfile): string {
	return profiles.find((p) => sameFabProfile(p.profile, profile))?.id ?? BUILT_IN_FAB_PROFILE_ID;
}

/** The same values, whatever the key order. */
function sameFabProfile(a: FabProfile, b: FabProfile): boolean {
	return JSON.stringify(Object.entries(a).sort()) === JSON.stringify(Object.entries(b).sort());
}

export interface RevisionFabCheck {
	/** The profile the page checks against: the recorded one, or the one ?profile= names. */
	profile: FabProfile;
	/** The revision's own profile, which its downloads (gate, fab notes) always use. */
	recorded: FabProfile;
	/** False for revisions older than the gate (the built-in stands in). */
	recordedStored: boolean;
	/** True when the page checks against values other than the recorded ones. */
	switched: boolean;
	/** The team's profiles to switch to, the built-in first. */
	choices: { id: string; name: string }[];
	/** The chosen profile's id; '' for the recorded one. */
	chosenId: string;
}

/**
 * What the revision page checks the revision against: its recorded profile, or, for a look without saving anything,
 * one of the team's others named by id (`?profile=`). An id that is not the built-in or one of the team's is an InputError.
 */
export async function revisionFabCheck(db: Kysely<Database>, opts: { teamId: string; revisionId: string; profileId: string | null; copperLayerCount?: number }): Promise<RevisionFabCheck> {
	const [{ profile: recorded, recorded: recordedStored }, profiles] = await Promise.all([revisionFabProfile(db, opts.revisionId, opts.copperLayerCount), listFabProfiles(db, opts.teamId)]);
	const choices = profiles.map((p) => ({ id: p.id, name: p.profile.name }));
	if (!opts.profileId) return { profile: recorded, recorded, recordedStored, switched: false, choices, chosenId: '' };
	const chosen = profiles.find((p) => p.id === opts.profileId);
	if (!chosen) throw new InputError([{ path: 'profile', value: opts.profileId, message: 'must be the built-in fab profile or one of the team’s fab profiles' }]);
	return { profile: chosen.profile, recorded, recordedStored, switched: !sameFabProfile(chosen.profile, recorded), choices, chosenId: chosen.id };
}
