// Dev only: the caught mail as JSON for tests (?to=someone@example.org narrows it to one recipient).
import { error, json } from '@sveltejs/kit';
import { readMailbox } from '$lib/server/mail/read-mailbox';
import type { RequestHandler } from './$types';

export const GET: RequestHandler = async ({ url }) => {
	if (process.env.FRINGEFIELD_DEV_MAILBOX !== '1') error(404, 'Not found');
	return json({ messages: await readMailbox(undefined, url.searchParams.get('to') ?? undefined) }, { headers: { 'cache-control': 'no-store' } });
};
