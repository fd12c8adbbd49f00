// The local SMTP fake: accepts every message on 127.0.0.1 and keeps it as an .eml file in the mailbox folder.
// Started by `npm start` and `npm test`; a real provider replaces it through SMTP_HOST/SMTP_PORT.
import { mkdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { SMTPServer } from 'smtp-server';

const port = Number(process.env.SMTP_PORT || 2525);
const mailbox = process.env.MAILBOX_DIR || join(process.cwd(), '.data', 'mail');
mkdirSync(mailbox, { recursive: true });
let counter = 0;

const server = new SMTPServer({
	authOptional: true,
	disabledCommands: ['STARTTLS'],
	size: 1024 * 1024,
	onData(stream, _session, callback) {
		const chunks: Buffer[] = [];
		stream.on('data', (c: Buffer) => chunks.push(c));
		stream.on('end', () => {
			const name = `${Date.now()}-${String(++counter).padStart(5, '0')}.eml`;
			writeFileSync(join(mailbox, name), Buffer.concat(chunks));
			callback();
		});
	}
});
server.on('error', (err) => console.error(`mail fake: ${err.message}`));
server.listen(port, '127.0.0.1', () => console.log(`mail fake listening on 127.0.0.1:${port}, mailbox ${mailbox}`));
for (const sig of ['SIGTERM', 'SIGINT'] as const) process.on(sig, () => server.close(() => process.exit(0)));
