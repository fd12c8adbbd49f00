// A private SMTP catcher for one test file: the app's own sendMail talks to it over real SMTP.
import { simpleParser } from 'mailparser';
import type { AddressInfo } from 'node:net';
import { SMTPServer } from 'smtp-server';

export interface CaughtMessage {
	to: string[];
	from: string;
	subject: string;
	text: string;
	links: string[];
}

export interface SmtpCatcher {
	messages: CaughtMessage[];
	/** Waits until a message to `to` has arrived (and returns the newest one). */
	waitFor(to: string, timeoutMs?: number): Promise<CaughtMessage>;
	close(): Promise<void>;
}

export async function startSmtpCatcher(): Promise<SmtpCatcher> {
	const messages: CaughtMessage[] = [];
	const server = new SMTPServer({
		authOptional: true,
		disabledCommands: ['STARTTLS'],
		logger: false,
		onData(stream, _session, callback) {
			simpleParser(stream)
				.then((mail) => {
					const to = (Array.isArray(mail.to) ? mail.to : mail.to ? [mail.to] : []).flatMap((a) => a.value.map((v) => v.address ?? ''));
					const text = mail.text ?? '';
					messages.push({ to, from: mail.from?.text ?? '', subject: mail.subject ?? '', text, links: [...text.matchAll(/https?:\/\/\S+/g)].map((m) => m[0]) });
					callback();
				})
				.catch((err: Error) => callback(err));
		}
	});
	await new Promise<void>((done) => server.listen(0, '127.0.0.1', () => done()));
	const { port } = server.server.address() as AddressInfo;
	process.env.SMTP_HOST = '127.0.0.1';
	process.env.SMTP_PORT = String(port);
	return {
		messages,
		async waitFor(to, timeoutMs = 5000) {
			const deadline = Date.now() + timeoutMs;
			for (;;) {
				const found = messages.filter((m) => m.to.includes(to));
				if (found.length > 0) return found[found.length - 1];
				if (Date.now() > deadline) throw new Error(`no mail to ${to} within ${timeoutMs} ms`);
				await new Promise((r) => setTimeout(r, 25));
			}
		},
		close: () => new Promise<void>((done) => server.close(() => done()))
	};
}

/** The token at the end of a link such as http://…/invites/<token>. */
export function tokenFromLink(link: string, prefix: '/invites/' | '/reset/' | '/confirm/'): string {
	const url = new URL(link);
	if (!url.pathname.startsWith(prefix)) throw new Error(`${link} is not a ${prefix} link`);
	return url.pathname.slice(prefix.length);
}
