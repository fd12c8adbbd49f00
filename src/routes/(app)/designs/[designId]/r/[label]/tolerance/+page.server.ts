// A revision's tolerance study: laminate εr and thickness tolerances (from the design input) and the etch tolerance (default
// from the fab profile recorded with the revision), editable; the page runs the seeded Monte Carlo itself (the pure core) as you type.
import { loadTolerancePage } from '$lib/server/tolerance/tolerance-page';
import type { PageServerLoad } from './$types';

export const load: PageServerLoad = ({ locals, params }) => loadTolerancePage(locals.identity, params.designId, params.label);
