// Publishes the sweep document's version-2 JSON Schema (draft 2020-12) at its stable URL, /schemas/sweep-v2.json.
import { sweepJsonSchema } from '$lib/formats';
import type { RequestHandler } from './$types';

export const GET: RequestHandler = () =>
	new Response(JSON.stringify(sweepJsonSchema, null, 2) + '\n', {
		headers: { 'content-type': 'application/schema+json', 'cache-control': 'public, max-age=3600' }
	});
