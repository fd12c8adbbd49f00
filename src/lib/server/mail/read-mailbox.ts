// The dev mailbox: the .eml files the local catcher keeps in MAILBOX_DIR, parsed with mailparser, newest first.
import { readdir, readFile } from 'node:fs/promises';
import { join } from 'node:path';
import { simpleParser, type AddressObject } from 'mailparser';

export interface CaughtMail {
	file: string;
	from: string;
	to: string[];
	subject: string;
	date: string | null;
	text: string;
	links: string[];
}

const MAX_MESSAGES = 200;

function addresses(field: AddressObject | AddressObject[] | undefined): string[] {
	const list = field === undefined ? [] : Array.isArray(field) ? field : [field];
	return list.flatMap((a) => a.value.map((v) => (v.address ?? v.name).toLowerCase()));
}

export function mailboxDir(): string {
	return process.env.MAILBOX_DIR || join(process.cwd(), '.data', 'mail');
}

/** Caught messages, newest first; `to` keeps only those addressed to that person. */
export async function readMailbox(dir = mailboxDir(), to?: string): Promise<CaughtMail[]> {
	let files: string[];
	try {
		files = (await readdir(dir)).filter((f) => f.endsWith('.eml'));
	} catch {
		return [];
	}
	files.sort().reverse();
	const wanted = to?.trim().toLowerCase();
	const out: CaughtMail[] = [];
	for (const file of files) {
		if (out.length >= MAX_MESSAGES) break;
		const parsed = await simpleParser(await readFile(join(dir, file)));
		const recipients = addresses(parsed.to);
		if (wanted && !recipients.includes(wanted)) continue;
		const text = parsed.text ?? '';
		out.push({
			file,
			from: addresses(parsed.from).join(', '),
			to: recipients,
			subject: parsed.subject ?? '',
			date: parsed.date ? parsed.date.toISOString() : null,
			text,
			links: [...text.matchAll(/https?:\/\/[^\s<>"]+/g)].map((m) => m[0])
		});
	}
	return out;
}
