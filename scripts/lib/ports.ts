// Port probing on loopback.
import { createServer, connect } from 'node:net';

/** True when something accepts TCP connections on 127.0.0.1:port. */
export function isPortOpen(port: number, host = '127.0.0.1'): Promise<boolean> {
	return new Promise((done) => {
		const socket = connect({ port, host });
		socket.once('connect', () => {
			socket.destroy();
			done(true);
		});
		socket.once('error', () => done(false));
	});
}

/** True when we could bind 127.0.0.1:port right now. */
export function canBind(port: number, host = '127.0.0.1'): Promise<boolean> {
	return new Promise((done) => {
		const server = createServer();
		server.once('error', () => done(false));
		server.listen(port, host, () => server.close(() => done(true)));
	});
}

export async function waitFor(check: () => Promise<boolean>, timeoutMs: number, stepMs = 100): Promise<boolean> {
	const until = Date.now() + timeoutMs;
	while (Date.now() < until) {
		if (await check()) return true;
		await new Promise((r) => setTimeout(r, stepMs));
	}
	return check();
}
