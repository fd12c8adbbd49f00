// The port count a Touchstone file name promises: ".s1p" → 1, ".s2p" → 2, anything else (".ts") → undefined.
import type { PortCount } from './touchstone-network';

export function portCountFromFileName(fileName: string): PortCount | undefined {
	const match = /\.s([12])p$/i.exec(fileName);
	return match ? (Number(match[1]) as PortCount) : undefined;
}
