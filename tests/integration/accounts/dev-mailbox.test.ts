// The dev mailbox: 404 unless the app runs in demo mode (src/lib/server/app-mode.ts); then the caught .eml files, parsed, newest first, filterable by recipient.
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startAppMode } from '../../../src/lib/server/app-mode';
import * as mailboxJson from '../../../src/routes/dev/mailbox.json/+server';
import * as mailboxPage from '../../../src/routes/dev/mailbox/+page.server';
import { call } from './helpers/route-event';

const dir = mkdtempSync(join(tmpdir(), 'ff-mailbox-'));
const anonymous = { user: null, sessionId: null, apiToken: null };

function eml(to: string, subject: string, body: string): string {
	return [`From: Fringefield <noreply@fringefield.test>`, `To: ${to}`, `Subject: ${subject}`, 'Date: Tue, 01 Dec 2026 10:00:00 +0000', 'Content-Type: text/plain; charset=utf-8', '', body, ''].join('\r\n');
}

beforeAll(() => {
	writeFileSync(join(dir, '1000-00001.eml'), eml('ana@example.org', 'First', 'Open http://127.0.0.1:3000/invites/abc to join.'));
	writeFileSync(join(dir, '2000-00002.eml'), eml('ben@example.org', 'Second', 'No links here.'));
	process.env.MAILBOX_DIR = dir;
});
afterAll(() => {
	rmSync(dir, { recursive: true, force: true });
});

describe('the dev mailbox', () => {
	it('does not exist in production mode, not even with the old FRINGEFIELD_DEV_MAILBOX=1', async () => {
		startAppMode({ FRINGEFIELD_MODE: 'production', FRINGEFIELD_LOCAL_TRIAL: '1', FRINGEFIELD_DEV_MAILBOX: '1' });
		expect((await call(mailboxPage.load as never, { identity: anonymous, path: '/dev/mailbox' })).outcome).toBe(404);
		expect((await call(mailboxJson.GET as never, { identity: anonymous, path: '/dev/mailbox.json' })).outcome).toBe(404);
	});

	it('lists the caught messages newest first with their links, and filters by recipient', async () => {
		startAppMode({ FRINGEFIELD_MODE: 'demo' });
		const page = await call(mailboxPage.load as never, { identity: anonymous, path: '/dev/mailbox' });
		const messages = (page.data as { messages: { subject: string; to: string[]; links: string[]; date: string }[] }).messages;
		expect(messages.map((m) => m.subject)).toEqual(['Second', 'First']);
		expect(messages[1]).toMatchObject({ to: ['ana@example.org'], links: ['http://127.0.0.1:3000/invites/abc'], date: '2026-12-01T10:00:00.000Z' });
		const res = (await call(mailboxJson.GET as never, { identity: anonymous, path: '/dev/mailbox.json?to=ANA@example.org' })).data as Response;
		const body = (await res.json()) as { messages: { subject: string }[] };
		expect(body.messages.map((m) => m.subject)).toEqual(['First']);
	});
});
