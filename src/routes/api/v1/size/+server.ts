// POST /api/v1/size: stateless sizing of a design-input document.
import { json } from '@sveltejs/kit';
import { apiHandler } from '$lib/server/api/api-handler';
import { parseJsonBody } from '$lib/server/api/parse-request';
import { sizeDocument } from '$lib/server/api/size-api';
import { z } from 'zod';
import type { RequestHandler } from './$types';

// The document is validated by sizing itself (so its issues carry the document's own field paths).
const anyJson = z.unknown();

export const POST: RequestHandler = apiHandler(async ({ event }) => {
	const raw = await parseJsonBody(anyJson, event.request);
	return json(sizeDocument(raw));
});
