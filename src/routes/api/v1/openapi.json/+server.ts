// GET /api/v1/openapi.json: the OpenAPI 3.1 document, generated from the zod schemas.
import { json } from '@sveltejs/kit';
import { openApiDocument } from '$lib/server/api/openapi-document';
import type { RequestHandler } from './$types';

export const GET: RequestHandler = () => json(openApiDocument(), { headers: { 'cache-control': 'no-cache' } });
