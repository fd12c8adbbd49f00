// /api/docs: the OpenAPI document, rendered for people (public, like the document itself).
import { openApiDocument } from '$lib/server/api/openapi-document';
import type { PageServerLoad } from './$types';

export const load: PageServerLoad = ({ url }) => ({ doc: JSON.parse(JSON.stringify(openApiDocument())) as Record<string, unknown>, origin: url.origin });
