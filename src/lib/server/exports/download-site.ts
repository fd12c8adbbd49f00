// Whether a download GET may write its export record: only for the user's own navigation or our own pages, or an API token.
import { error } from '@sveltejs/kit';
import type { RequestIdentity } from '../auth/request-identity';

/**
 * Sec-Fetch-Site values (Fetch Metadata Request Headers, W3C) a browser sends for a request made by our own
 * pages (`same-origin`), a sibling site (`same-site`) or the user's own navigation — typed address, bookmark,
 * download manager (`none`).
 */
export const RECORDABLE_FETCH_SITES: readonly string[] = ['same-origin', 'same-site', 'none'];

export const CROSS_SITE_DOWNLOAD_MESSAGE =
	'Downloads are recorded in the team’s export log, so they start on Fringefield itself: open the revision and download from there (a link or image on another site cannot start one).';

/**
 * Throws 403 when a signed-in session's GET of a download comes from another site (`Sec-Fetch-Site: cross-site`,
 * e.g. an <img> or a link on another page): such a request is not the user's own choice, and answering it would
 * write an export record in their name. An API token is never sent by another site, so it always passes; so does
 * a request without the header (scripts, and browsers too old to send it).
 */
export function refuseCrossSiteDownload(request: Request, identity: RequestIdentity): void {
	if (identity.apiToken || !identity.sessionId) return;
	const site = request.headers.get('sec-fetch-site');
	if (site === null || RECORDABLE_FETCH_SITES.includes(site.trim().toLowerCase())) return;
	error(403, CROSS_SITE_DOWNLOAD_MESSAGE);
}
