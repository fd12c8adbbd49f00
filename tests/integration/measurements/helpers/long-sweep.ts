// A long measured sweep as Touchstone text: the series-RLC reflection of the bench fixture (demo data, invented), any number of points.
// Γ = (Z − Z0)/(Z + Z0) with Z = R + j(ωL − 1/(ωC)) (Pozar, Microwave Engineering, 4th ed., eq. 2.35, from memory).

const R_OHM = 46;
const Q = 28;
const RESONANCE_HZ = 2.41e9;
const Z0_OHM = 50;

/** `count` points from 2.0 to 3.0 GHz in MHz / dB-angle, minimum near 2.41 GHz. About 22 bytes a line. */
export function longSweepS1p(count: number): Uint8Array {
	const w0 = 2 * Math.PI * RESONANCE_HZ;
	const l = (Q * R_OHM) / w0;
	const c = 1 / (w0 * w0 * l);
	const lines = ['! Demo data (invented): a long bench sweep of a 2.45 GHz patch, series-RLC model, minimum at 2.41 GHz.', '# MHz S DB R 50'];
	for (let i = 0; i < count; i++) {
		const hz = 2e9 + (i / (count - 1)) * 1e9;
		const w = 2 * Math.PI * hz;
		const x = w * l - 1 / (w * c);
		// Γ = (R − Z0 + jX) / (R + Z0 + jX)
		const nRe = R_OHM - Z0_OHM;
		const dRe = R_OHM + Z0_OHM;
		const den = dRe * dRe + x * x;
		const re = (nRe * dRe + x * x) / den;
		const im = (x * dRe - nRe * x) / den;
		const db = 20 * Math.log10(Math.hypot(re, im));
		const angle = (Math.atan2(im, re) * 180) / Math.PI;
		lines.push(`${(hz / 1e6).toFixed(4)} ${db.toFixed(2)} ${angle.toFixed(1)}`);
	}
	return new TextEncoder().encode(`${lines.join('\n')}\n`);
}
