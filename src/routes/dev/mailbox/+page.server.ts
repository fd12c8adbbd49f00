// Demo mode only (app-mode.ts; npm start on the private cluster and the e2e server): the mail the local catcher kept.
import { error } from '@sveltejs/kit';
import { appMode } from '$lib/server/app-mode';
import { readMailbox } from '$lib/server/mail/read-mailbox';
import type { PageServerLoad } from './$types';

export const load: PageServerLoad = async ({ url }) => {
	if (!appMode().mailbox) error(404, 'Not found');
	const to = url.searchParams.get('to') ?? '';
	return { to, messages: await readMailbox(undefined, to || undefined) };
};
