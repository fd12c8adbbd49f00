// One design's export log (rows fetched by the browser from /api/v1/teams/{teamId}/exports?designId=…).
import { authorize } from '$lib/server/access';
import { lookupDesign } from '$lib/server/designs/design-access';
import type { PageServerLoad } from './$types';

export const load: PageServerLoad = async ({ locals, params }) => {
	const { design, role } = await lookupDesign(locals.identity, params.designId);
	authorize(role, 'team.read', 'Design not found');
	return { design: { id: design!.id, name: design!.name, teamId: design!.teamId } };
};
