// The two export-log pages' loads × {non-member, viewer, editor, owner}: members see the log, a non-member gets 404.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeDb } from '../../../src/lib/server/db';
import { load as designLogLoad } from '../../../src/routes/(app)/designs/[designId]/exports/+page.server';
import { load as teamLogLoad } from '../../../src/routes/(app)/exports/+page.server';
import { createWorkspace, identityOf, type CallerKind, type Workspace } from './workspace-fixture';

let ws: Workspace;
beforeAll(async () => {
	ws = await createWorkspace('pages');
});
afterAll(() => closeDb());

async function status(fn: () => unknown): Promise<number> {
	try {
		await fn();
		return 200;
	} catch (err) {
		const e = err as { status?: number };
		if (typeof e.status === 'number') return e.status;
		throw err;
	}
}

const expected: Record<Exclude<CallerKind, 'anonymous'>, number> = { 'non-member': 404, viewer: 200, editor: 200, owner: 200 };

describe('the design export-log page', () => {
	it.each(Object.entries(expected))('loads for %s with %i', async (who, code) => {
		const identity = await identityOf(ws, who as CallerKind, 'session');
		const event = { locals: { identity, user: identity.user }, params: { designId: ws.designId } };
		expect(await status(() => designLogLoad(event as never))).toBe(code);
	});

	it('hands the page the design’s team, which the browser then asks the API about', async () => {
		const identity = await identityOf(ws, 'viewer', 'session');
		const data = (await designLogLoad({ locals: { identity, user: identity.user }, params: { designId: ws.designId } } as never)) as { design: { teamId: string } };
		expect(data.design.teamId).toBe(ws.teamId);
	});
});

describe('the team export-log page', () => {
	it('shows the current team’s log to a member and asks one with no team to make or join one', async () => {
		const viewer = (await teamLogLoad({ parent: async () => ({ team: { id: ws.teamId, name: 'x', role: 'viewer' } }) } as never)) as { logTeam: { id: string } | null };
		expect(viewer.logTeam?.id).toBe(ws.teamId);
		const none = (await teamLogLoad({ parent: async () => ({ team: null }) } as never)) as { logTeam: unknown };
		expect(none.logTeam).toBeNull();
	});
});
