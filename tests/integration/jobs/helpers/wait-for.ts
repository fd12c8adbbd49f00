// Polls until `probe` returns a value that is not undefined/false, or fails after `timeoutMs`.
export async function waitFor<T>(what: string, probe: () => Promise<T | undefined | false | null>, timeoutMs = 20_000, everyMs = 100): Promise<T> {
	const until = Date.now() + timeoutMs;
	for (;;) {
		const value = await probe();
		if (value !== undefined && value !== false && value !== null) return value;
		if (Date.now() > until) throw new Error(`timed out after ${timeoutMs} ms waiting for ${what}`);
		await new Promise((r) => setTimeout(r, everyMs));
	}
}
