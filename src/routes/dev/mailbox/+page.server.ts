// Dev only (FRINGEFIELD_DEV_MAILBOX=1, set by npm start and the e2e server): the mail the local catcher kept.
import { error } from '@sveltejs/kit';
import { readMailbox } from '$lib/server/mail/read-mailbox';
import type { PageServerLoad } from './$types';

export const load: PageServerLoad = async ({ url }) => {
	if (process.env.FRINGEFIELD_DEV_MAILBOX !== '1') error(404, 'Not found');
	const to = url.searchParams.get('to') ?? '';
	return { to, messages: await readMailbox(undefined, to || undefined) };
};
