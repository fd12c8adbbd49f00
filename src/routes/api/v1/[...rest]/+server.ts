// Any other /api/v1 path: a JSON 404 (or 405 for a method a route does not take), never an HTML page.
import { apiHandler, problem } from '$lib/server/api/api-handler';
import type { RequestHandler } from './$types';

const notFound: RequestHandler = apiHandler(({ event }) => problem(404, `No API route ${event.request.method} ${event.url.pathname}`));

export const GET = notFound;
export const POST = notFound;
export const PUT = notFound;
export const PATCH = notFound;
export const DELETE = notFound;
