// The demo designs: written through the services, with the ISM fork, and safe to run twice.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { seedDemoDesigns } from '../../../scripts/lib/seed-designs';
import { closeDb, getDb } from '../../../src/lib/server/db';
import { findDesignWithRevisions, listDesigns } from '../../../src/lib/server/designs';
import { createTestTeam, type TestTeam } from './test-team';

const db = getDb();
let team: TestTeam;
beforeAll(async () => {
	team = await createTestTeam(db, 'seed');
});
afterAll(() => closeDb());

describe('seedDemoDesigns', () => {
	it('creates four demo designs once, the ISM one with B and C both forked from A', async () => {
		const ids = { owner: team.users.owner.id, editor: team.users.editor.id, viewer: team.users.viewer.id };
		expect(await seedDemoDesigns(db, team.teamId, ids)).toBe(4);
		expect(await seedDemoDesigns(db, team.teamId, ids)).toBe(0);
		const list = await listDesigns(db, team.teamId);
		expect(list).toHaveLength(4);
		const ism = list.find((d) => d.slug === 'bench-node-2-4-ghz-inset-patch')!;
		const found = await findDesignWithRevisions(db, ism.id);
		expect(found!.revisions.map((r) => `${r.label}<${r.parentLabel ?? '-'}`)).toEqual(['A<-', 'B<A', 'C<A']);
		const gnss = list.find((d) => d.slug === 'kestrel-gnss-l1-puck')!;
		expect(gnss.latest).toEqual({ shape: 'truncated-corner', feed: 'probe', frequencyHz: 1575.42e6 });
	});
});
