// Demo mode only (app-mode.ts): the caught mail as JSON for tests (?to=someone@example.org narrows it to one recipient).
import { error, json } from '@sveltejs/kit';
import { appMode } from '$lib/server/app-mode';
import { readMailbox } from '$lib/server/mail/read-mailbox';
import type { RequestHandler } from './$types';

export const GET: RequestHandler = async ({ url }) => {
	if (!appMode().mailbox) error(404, 'Not found');
	return json({ messages: await readMailbox(undefined, url.searchParams.get('to') ?? undefined) }, { headers: { 'cache-control': 'no-store' } });
};
