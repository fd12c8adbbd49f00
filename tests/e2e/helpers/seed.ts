// Direct set-up for journeys that start past sign-up: an editor in a team of their own, with one design (revision A).
import { randomBytes } from 'node:crypto';
import { getDb } from '../../../src/lib/server/db';
import { hashPassword } from '../../../src/lib/server/auth/password';
import { createDesign } from '../../../src/lib/server/designs/create-design';

export interface SeededEditor {
	editor: { id: string; email: string; password: string };
	teamId: string;
	designId: string;
	suffix: string;
}

/** `tag` names the journey in the ids; `designName` gets the suffix; `raw` is the design-input document. */
export async function seedEditorWithDesign(tag: string, designName: string, raw: Record<string, unknown>): Promise<SeededEditor> {
	const suffix = randomBytes(4).toString('hex');
	const editor = { id: `e2e-${tag}-${suffix}`, email: `${tag}-${suffix}@e2e.test`, password: `${tag}-${suffix}-pass` };
	const teamId = `team-${tag}-${suffix}`;
	const db = getDb();
	await db.insertInto('app_user').values({ id: editor.id, email: editor.email, display_name: `${designName} ${suffix}`, password_hash: await hashPassword(editor.password) }).execute();
	await db.insertInto('team').values({ id: teamId, name: `${designName} team ${suffix}` }).execute();
	await db.insertInto('team_member').values({ team_id: teamId, user_id: editor.id, role: 'editor' }).execute();
	const { design } = await createDesign(db, { teamId, userId: editor.id, raw: { ...raw, name: `${designName} ${suffix}` } });
	return { editor, teamId, designId: design.id, suffix };
}

export interface SeededTeam {
	people: Record<'owner' | 'editor' | 'viewer', { id: string; email: string; password: string }>;
	teamId: string;
	designId: string;
}

/** A team with one confirmed person in each role and one design (revision A), made by the editor. */
export async function seedTeamWithEveryRole(tag: string, raw: Record<string, unknown>): Promise<SeededTeam> {
	const suffix = randomBytes(4).toString('hex');
	const teamId = `team-${tag}-${suffix}`;
	const db = getDb();
	await db.insertInto('team').values({ id: teamId, name: `${tag} team ${suffix}` }).execute();
	const people = {} as SeededTeam['people'];
	for (const role of ['owner', 'editor', 'viewer'] as const) {
		const person = { id: `e2e-${tag}-${role}-${suffix}`, email: `${tag}-${role}-${suffix}@e2e.test`, password: `${tag}-${role}-${suffix}-pass` };
		await db
			.insertInto('app_user')
			.values({ id: person.id, email: person.email, display_name: `${role} ${suffix}`, password_hash: await hashPassword(person.password), email_verified_at: new Date() })
			.execute();
		await db.insertInto('team_member').values({ team_id: teamId, user_id: person.id, role }).execute();
		people[role] = person;
	}
	const { design } = await createDesign(db, { teamId, userId: people.editor.id, raw: { ...raw, name: `${tag} patch ${suffix}` } });
	return { people, teamId, designId: design.id };
}
