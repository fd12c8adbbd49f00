// Keeps publishing the version-1 sweep JSON Schema (draft 2020-12) at /schemas/sweep-v1.json, so documents written before version 2 stay readable.
import { sweepJsonSchemaV1 } from '$lib/formats';
import type { RequestHandler } from './$types';

export const GET: RequestHandler = () =>
	new Response(JSON.stringify(sweepJsonSchemaV1, null, 2) + '\n', {
		headers: { 'content-type': 'application/schema+json', 'cache-control': 'public, max-age=3600' }
	});
