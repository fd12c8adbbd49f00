// Download from the app: one format or the bundle of any revision, old ones included; recorded with via 'ui'. Viewers may download.
// A GET from another site (Sec-Fetch-Site: cross-site) is refused with 403 and records nothing.
// A design that breaks its fab profile is sent to the refusal page (the list, and a waiver form for editors);
// POST with a `waiver` reason exports it anyway (editors and owners; a viewer gets 403).
import { redirect } from '@sveltejs/kit';
import { parseParams } from '$lib/server/api/parse-request';
import { downloadResponse, exportForRequest, refusalOf, refuseCrossSiteDownload } from '$lib/server/exports';
import { withInputErrors } from '$lib/server/http/input-error-response';
import { InputError } from '$lib/schemas';
import { exportParamsSchema } from '$lib/schemas/api';
import type { RequestHandler } from './$types';

const refusedPage = (designId: string, label: string, format: string, issue?: string) =>
	`/designs/${encodeURIComponent(designId)}/r/${encodeURIComponent(label)}/export/refused?format=${format}${issue ? `&issue=${encodeURIComponent(issue)}` : ''}`;

export const GET: RequestHandler = ({ locals, params, url, request }) =>
	withInputErrors(async () => {
		if (!locals.user) redirect(303, `/signin?next=${encodeURIComponent(url.pathname)}`);
		refuseCrossSiteDownload(request, locals.identity);
		const { designId, label, format } = parseParams(exportParamsSchema, params);
		try {
			return downloadResponse(await exportForRequest({ ...locals.identity, user: locals.user }, { designId, label, kind: format }, 'ui'));
		} catch (err) {
			if (refusalOf(err)) redirect(303, refusedPage(designId, label, format));
			throw err;
		}
	});

export const POST: RequestHandler = ({ locals, params, url, request }) =>
	withInputErrors(async () => {
		if (!locals.user) redirect(303, `/signin?next=${encodeURIComponent(url.pathname)}`);
		const { designId, label, format } = parseParams(exportParamsSchema, params);
		const waiver = (await request.formData()).get('waiver');
		try {
			return downloadResponse(await exportForRequest({ ...locals.identity, user: locals.user }, { designId, label, kind: format }, 'ui', { waiver: typeof waiver === 'string' ? waiver : '' }));
		} catch (err) {
			if (err instanceof InputError) redirect(303, refusedPage(designId, label, format, err.first.message));
			throw err;
		}
	});
