// Revision labels: 1 → A … 26 → Z, 27 → AA, 28 → AB … (bijective base 26, like spreadsheet columns).

export function revisionLabel(seq: number): string {
	if (!Number.isInteger(seq) || seq < 1) throw new RangeError(`revision sequence must be a positive integer (got ${seq})`);
	let n = seq;
	let label = '';
	while (n > 0) {
		const digit = (n - 1) % 26;
		label = String.fromCharCode(65 + digit) + label;
		n = Math.floor((n - 1) / 26);
	}
	return label;
}

/** The inverse: "A" → 1, "AA" → 27; null for anything that is not a label. */
export function revisionSeq(label: string): number | null {
	if (!/^[A-Z]{1,6}$/.test(label)) return null;
	let n = 0;
	for (const ch of label) n = n * 26 + (ch.charCodeAt(0) - 64);
	return n;
}
