// Settings has one page so far: the personal API tokens.
import { redirect } from '@sveltejs/kit';
import type { PageServerLoad } from './$types';

export const load: PageServerLoad = () => redirect(307, '/settings/tokens');
