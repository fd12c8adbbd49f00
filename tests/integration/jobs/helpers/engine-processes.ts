// The engine processes (openEMS) a given process started, read from /proc (Linux).
import { readdirSync, readFileSync } from 'node:fs';

export function engineChildrenOf(parentPid: number, command = 'openEMS'): number[] {
	const found: number[] = [];
	for (const entry of readdirSync('/proc')) {
		if (!/^\d+$/.test(entry)) continue;
		try {
			const stat = readFileSync(`/proc/${entry}/stat`, 'utf8');
			// "pid (comm) state ppid …" — comm may hold spaces, so split after the last ')'.
			const comm = stat.slice(stat.indexOf('(') + 1, stat.lastIndexOf(')'));
			const ppid = Number(stat.slice(stat.lastIndexOf(')') + 2).split(' ')[1]);
			if (comm === command && ppid === parentPid) found.push(Number(entry));
		} catch {
			/* the process ended while we looked */
		}
	}
	return found;
}

export function isAlive(pid: number): boolean {
	try {
		process.kill(pid, 0);
		return true;
	} catch {
		return false;
	}
}
