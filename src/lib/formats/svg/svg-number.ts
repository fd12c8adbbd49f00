// The SVG writer's one number format for coordinates.

/** Fixed number format for coordinates: 4 decimals (0.1 µm), no trailing zeros, no "-0". Printed sizes use the sheet's decimals. */
export function svgNumber(v: number): string {
	const n = Math.round(v * 1e4) / 1e4;
	return String(n === 0 ? 0 : n);
}
