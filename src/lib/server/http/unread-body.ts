// A request body the answer did not read is read to its end (and dropped) before the answer goes out, on every way
// out of the request hook: a refusal by one of the guards, a route that ignores its body, a thrown error.
//
// Why: adapter-node hands SvelteKit the body as a stream that pulls from Node's request. Once that stream has started
// (it starts at once), Node no longer discards a body nobody read when the answer ends (Node.js `_http_server`
// resOnFinish dumps a request only when nothing consumed it), so a body larger than the stream's buffers stays half
// read: Node stops reading the socket, and the next request the client sends on that kept-alive connection is never
// parsed. The client waits for an answer until the server's keep-alive timer closes the connection (ECONNRESET) or
// its own header timeout fires. The 10 000-case fuzz met it as one unanswered request per run after
// `POST /api/v1/simulations/%00/cancel` with a 270 kB JSON body (the NUL refusal answered before the body was read).
//
// Reading is bounded: adapter-node's BODY_SIZE_LIMIT errors the stream past the limit (nothing more is kept), and a
// client that stops sending gets the answer after UNREAD_BODY_WAIT_MS with `connection: close`, so its connection
// is closed behind the answer rather than left waiting.

/** How long the answer waits for the rest of a body it did not need. */
export const UNREAD_BODY_WAIT_MS = 10_000;

const BODILESS = new Set(['GET', 'HEAD', 'OPTIONS']);

type Drained = 'nothing-left' | 'drained' | 'gave-up';

async function drain(request: Request, waitMs: number): Promise<Drained> {
	if (BODILESS.has(request.method) || request.body === null) return 'nothing-left';
	// Read already: text(), json(), formData() and arrayBuffer() read to the end before they resolve (and keep the
	// stream locked); a route reading the stream itself reads it to its end.
	if (request.bodyUsed) return 'nothing-left';
	// A reader someone took and never used: the body cannot be reached from here.
	if (request.body.locked) return 'gave-up';
	const reader = request.body.getReader();
	let timer: ReturnType<typeof setTimeout> | undefined;
	const late = new Promise<'gave-up'>((resolve) => (timer = setTimeout(() => resolve('gave-up'), waitMs)));
	const read = (async (): Promise<Drained> => {
		try {
			while (!(await reader.read()).done) {
				/* dropped */
			}
		} catch {
			// past BODY_SIZE_LIMIT, or the client went away: the stream is finished either way
		}
		return 'drained';
	})();
	try {
		// Not cancelled on giving up: cancelling the stream destroys Node's request, the socket and the answer with it.
		return await Promise.race([read, late]);
	} finally {
		clearTimeout(timer);
	}
}

/**
 * `response`, once the request's unread body has been read to its end; with `connection: close` when it could not
 * be (the client stopped sending, or a reader was taken and left unused).
 */
export async function afterUnreadBody(request: Request, response: Response, waitMs: number = UNREAD_BODY_WAIT_MS): Promise<Response> {
	if ((await drain(request, waitMs)) !== 'gave-up') return response;
	try {
		response.headers.set('connection', 'close');
		return response;
	} catch {
		// immutable headers (a fetched response passed through): a copy carries the header
		const headers = new Headers(response.headers);
		headers.set('connection', 'close');
		return new Response(response.body, { status: response.status, statusText: response.statusText, headers });
	}
}
