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
