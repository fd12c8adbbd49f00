// One HTTP/1.1 request on a raw socket the test keeps open, and its answer read to its Content-Length: what the
// kept-alive tests need to send a second request on the same connection (fetch hides the connection).
import type { Socket } from 'node:net';

export interface RawAnswer {
	head: string;
	body: string;
}

/** Sends `head` then `body` on the socket; resolves with the answer once its Content-Length has arrived, rejects when the
 * server closes the connection first or after `waitMs` without a whole answer. */
export function exchange(socket: Socket, head: string, body: string | Uint8Array = '', waitMs = 8000): Promise<RawAnswer> {
	return new Promise((resolve, reject) => {
		if (socket.destroyed || socket.readyState !== 'open') return reject(new Error('the server had closed the connection before the request was sent'));
		let received = Buffer.alloc(0);
		const onData = (chunk: Buffer) => {
			received = Buffer.concat([received, chunk]);
			const headEnd = received.indexOf('\r\n\r\n');
			if (headEnd < 0) return;
			const answerHead = received.subarray(0, headEnd).toString('latin1');
			const length = /content-length: *(\d+)/i.exec(answerHead)?.[1];
			if (length !== undefined && received.length >= headEnd + 4 + Number(length)) done(() => resolve({ head: answerHead, body: received.subarray(headEnd + 4).toString('utf8') }));
		};
		const onClose = () => {
			const text = received.toString('latin1');
			done(() => reject(new Error(`the server closed the connection${text ? ` after ${JSON.stringify(text.slice(0, 80))}` : ' without an answer'}`)));
		};
		const timer = setTimeout(() => done(() => reject(new Error(`no answer within ${waitMs} ms`))), waitMs);
		const done = (settle: () => void) => {
			clearTimeout(timer);
			socket.off('data', onData);
			socket.off('close', onClose);
			settle();
		};
		socket.on('data', onData);
		socket.once('close', onClose);
		socket.write(head);
		if (body.length > 0) socket.write(body);
	});
}
