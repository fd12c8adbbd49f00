// A revision's tolerance study: laminate εr and thickness tolerances (from the design input) and the etch tolerance (default
// from the revision's recorded fab profile, or the one ?profile= names on the revision page), editable; the page runs the
// seeded Monte Carlo itself (the pure core) as you type.
import { loadTolerancePage } from '$lib/server/tolerance/tolerance-page';
import type { PageServerLoad } from './$types';

export const load: PageServerLoad = ({ locals, params, url }) => loadTolerancePage(locals.identity, params.designId, params.label, url.searchParams.get('profile'));
