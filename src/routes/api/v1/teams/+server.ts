// GET /api/v1/teams: the caller's teams (an API token: its own team only).
import { json } from '@sveltejs/kit';
import { apiHandler } from '$lib/server/api/api-handler';
import { listMyTeams } from '$lib/server/api/team-api';
import type { RequestHandler } from './$types';

export const GET: RequestHandler = apiHandler(async ({ identity }) => json(await listMyTeams(identity)));
