// The settings the app server (adapter-node's `node build`) is started with by `npm start`, `npm run serve`, the
// benchmarks and the tests, where the user has not set them.
//
// Keep-alive: Node's HTTP server closes an idle kept-alive connection after 5 s. A client (a load balancer, a
// script's connection pool, the browser) that sends its next request on that connection just as the server closes
// it gets a reset ("other side closed", ECONNRESET) with no answer; a POST is then lost. The soak met exactly this
// on a starved machine, where the client's own idle timer fires late. The usual remedy is a server idle timeout
// longer than any client's or proxy's (common practice, no source: proxies commonly keep idle upstream
// connections for up to 60 s), so the client always closes first. adapter-node reads both in seconds.
export const SERVER_ENV_DEFAULTS = {
	/** largest request body the server reads (Touchstone uploads are limited to 5 MB) */
	BODY_SIZE_LIMIT: '6M',
	/** seconds an idle kept-alive connection stays open on the server: longer than the clients' */
	KEEP_ALIVE_TIMEOUT: '65',
	/** seconds the server waits for a request's headers; Node wants it above the keep-alive timeout */
	HEADERS_TIMEOUT: '66'
} as const;

/** The defaults above, each replaced by the environment's own value when it sets one. */
export function serverEnv(env: NodeJS.ProcessEnv = process.env): Record<keyof typeof SERVER_ENV_DEFAULTS, string> {
	return {
		BODY_SIZE_LIMIT: env.BODY_SIZE_LIMIT || SERVER_ENV_DEFAULTS.BODY_SIZE_LIMIT,
		KEEP_ALIVE_TIMEOUT: env.KEEP_ALIVE_TIMEOUT || SERVER_ENV_DEFAULTS.KEEP_ALIVE_TIMEOUT,
		HEADERS_TIMEOUT: env.HEADERS_TIMEOUT || SERVER_ENV_DEFAULTS.HEADERS_TIMEOUT
	};
}
