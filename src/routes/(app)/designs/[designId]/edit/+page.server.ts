// The editor: starts from exactly the revision named by ?from=; saving makes a new revision from it and goes there.
import { loadEditorPage, saveEditorForm } from '$lib/server/designs/editor-page';
import type { Actions, PageServerLoad } from './$types';

export const load: PageServerLoad = (event) => loadEditorPage(event, event.params.designId);

export const actions: Actions = {
	save: (event) => saveEditorForm(event, event.params.designId)
};
